import { describe, expect, it } from 'vitest';
import { escapeControlCharacters, hasControlCharacters } from '../../hostio/terminalText';

// ECMA-48: C0 is U+0000-U+001F, C1 is U+0080-U+009F; Unicode UAX #9: U+202A-U+202E, U+2066-U+2069 are bidi controls.
describe('terminalText', () => {
  it('escapeControlCharacters writes C0, DEL, C1 and bidi controls as escapes and keeps line feeds and tabs', () => {
    expect(escapeControlCharacters('a\u001b]0;title\u0007b')).toBe('a\\x1b]0;title\\x07b');
    expect(escapeControlCharacters('x\ry\u007fz\u0085')).toBe('x\\x0dy\\x7fz\\x85');
    expect(escapeControlCharacters('abc\u202edef\u2066')).toBe('abc\\u202edef\\u2066');
    expect(escapeControlCharacters('line 1\n\tline 2')).toBe('line 1\n\tline 2');
    expect(escapeControlCharacters('35,000 ft — Mach 0.78 °C')).toBe('35,000 ft — Mach 0.78 °C');
  });

  it('hasControlCharacters says whether anything would be escaped', () => {
    expect(hasControlCharacters('plain\n')).toBe(false);
    expect(hasControlCharacters('bell\u0007')).toBe(true);
    expect(hasControlCharacters('bell\u0007')).toBe(true);
  });
});
