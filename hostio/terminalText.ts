/**
 * Text for a terminal: control characters that a file or a name could carry
 * (ESC sequences that clear the screen or set the window title, a carriage
 * return that overwrites a line, bidirectional overrides that reorder what is
 * read) are shown as escapes instead of being acted on. Line feeds and tabs
 * pass. ECMA-48 defines the C0 and C1 control sets; the bidirectional controls
 * are Unicode's (UAX #9), escaped as is common practice since the "Trojan
 * Source" reports (CVE-2021-42574).
 */

// C0 controls except TAB (09) and LF (0A), DEL, C1 controls, and the bidi embedding, override and isolate controls.
// eslint-disable-next-line no-control-regex -- matching control characters is the point
const CONTROL = /[\u0000-\u0008\u000b-\u001f\u007f-\u009f\u202a-\u202e\u2066-\u2069]/g;

function escapeOne(c: string): string {
  const code = c.charCodeAt(0);
  return code <= 0xff ? `\\x${code.toString(16).padStart(2, '0')}` : `\\u${code.toString(16).padStart(4, '0')}`;
}

/** `text` with every control character but line feed and tab written as `\xHH` or `\uHHHH`. */
export function escapeControlCharacters(text: string): string {
  return text.replace(CONTROL, escapeOne);
}

/** True when `text` holds a character escapeControlCharacters would escape. */
export function hasControlCharacters(text: string): boolean {
  CONTROL.lastIndex = 0;
  const found = CONTROL.test(text);
  CONTROL.lastIndex = 0;
  return found;
}
