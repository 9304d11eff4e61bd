/**
 * The schema of one field of the project file, so that a new value of that
 * field can be read alone, as the whole file's parse would read it: a study
 * that varies the field (engine/study/prepareSweep.ts) reads each value once
 * and sets it into the parsed project instead of parsing the file again per
 * case. Found by walking projectSchema along the field's JSON path, the
 * document choosing each discriminated union's option. Only fields whose
 * reading depends on their own value alone qualify: a quantity, a plain
 * number or text, a union of those, optional or with a default; not a
 * union's discriminator (it chooses the shape of the fields beside it), and
 * nothing under an object or list with a refinement of its own or a
 * transform.
 */
import type { z } from 'zod';
import type { Result } from '../core/result';
import { err, ok } from '../core/result';
import { quantityDimensionOf } from './quantityField';
import type { JsonPath } from './projectIssue';
import { projectSchema } from './projectSchema';

interface SchemaDef {
  readonly type: string;
  readonly shape?: Readonly<Record<string, z.ZodType>>;
  readonly element?: z.ZodType;
  readonly options?: readonly z.ZodType[];
  readonly discriminator?: string;
  readonly innerType?: z.ZodType;
  readonly values?: readonly unknown[];
  readonly checks?: readonly { readonly _zod: { readonly def: { readonly check: string } } }[];
}

function defOf(schema: z.ZodType): SchemaDef {
  return (schema as unknown as { _zod: { def: SchemaDef } })._zod.def;
}

function isRecord(value: unknown): value is Record<string, unknown> {
  return value !== null && typeof value === 'object' && !Array.isArray(value);
}

/** A refinement of the node's own (it may read several fields at once). */
function refined(def: SchemaDef): boolean {
  return (def.checks ?? []).some((c) => c._zod.def.check === 'custom');
}

/**
 * The schema that reads `node`: through optional, default and nullable wrappers and a discriminated union's option
 * (its tag's name noted in `tags`); null when none can be told apart.
 */
function unwrap(schema: z.ZodType, node: unknown, tags: string[]): z.ZodType | null {
  let s = schema;
  for (;;) {
    const def = defOf(s);
    if (def.type === 'optional' || def.type === 'default' || def.type === 'nullable' || def.type === 'nonoptional') {
      s = def.innerType as z.ZodType;
    } else if (def.type === 'union' && def.discriminator !== undefined && isRecord(node)) {
      const tag = node[def.discriminator];
      const option = (def.options ?? []).find((o) => {
        const field = defOf(o).shape?.[def.discriminator!];
        return field !== undefined && defOf(field).type === 'literal' && (defOf(field).values ?? []).includes(tag);
      });
      if (option === undefined) return null;
      tags.push(def.discriminator);
      s = option;
    } else {
      return s;
    }
  }
}

/** True when the field's schema reads a value by itself: a quantity, a plain value, or unions and wrappers of those. */
function contextFree(schema: z.ZodType): boolean {
  if (quantityDimensionOf(schema) !== undefined) return true;
  const def = defOf(schema);
  switch (def.type) {
    case 'number':
    case 'string':
    case 'literal':
    case 'enum':
    case 'boolean':
      return true;
    case 'optional':
    case 'default':
    case 'nullable':
      return contextFree(def.innerType as z.ZodType);
    case 'union':
      return def.discriminator === undefined && (def.options ?? []).every(contextFree);
    default:
      return false;
  }
}

/** Reads one value of a field as the project's schema would, to its parsed (SI) form; `err` when the schema refuses it. */
export type FieldReader = (value: unknown) => Result<unknown, { readonly code: 'refused' }>;

/**
 * The reader of the field at `path` of the project document `doc` (the
 * current layout, as the schema reads it), or null when the field's reading
 * may depend on more than its own value (see the file comment).
 */
export function fieldReaderAt(doc: unknown, path: JsonPath): FieldReader | null {
  let schema: z.ZodType = projectSchema as unknown as z.ZodType;
  let node: unknown = doc;
  for (const step of path) {
    const tags: string[] = [];
    const s = unwrap(schema, node, tags);
    if (s === null) return null;
    const def = defOf(s);
    if (refined(def)) return null;
    if (def.type === 'object' && typeof step === 'string' && isRecord(node)) {
      // A discriminated union's tag chooses the shape of its siblings: it is not read alone.
      if (tags.includes(step)) return null;
      const field = def.shape?.[step];
      if (field === undefined) return null;
      schema = field;
      node = node[step];
    } else if (def.type === 'array' && typeof step === 'number' && Array.isArray(node)) {
      schema = def.element as z.ZodType;
      node = node[step];
    } else {
      return null;
    }
  }
  if (!contextFree(schema)) return null;
  const leaf = schema;
  return (value) => {
    const r = leaf.safeParse(value);
    return r.success ? ok(r.data) : err({ code: 'refused' as const });
  };
}
