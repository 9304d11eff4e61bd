/**
 * The key order of a plain object and of the plain objects inside it (arrays, typed arrays and functions stand for
 * themselves): two values with the same outline were written key by key in the same order, which is what lets the
 * JavaScript engine give them one hidden class (common practice: V8's maps follow property order).
 */
export function keyOutline(value: unknown): unknown {
  if (value === null || typeof value !== 'object' || Array.isArray(value) || ArrayBuffer.isView(value)) return typeof value;
  return Object.entries(value).map(([key, v]) => [key, keyOutline(v)]);
}
