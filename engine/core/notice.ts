/**
 * The notice every summary, screen and report carries (DESIGN.md §7).
 * One sentence per line so that text, HTML and PDF renderers can wrap it.
 */
export const SAFETY_NOTICE_LINES: readonly string[] = [
  'Conceptual planning figures only: not approved flight-planning or performance data.',
  "The aircraft's approved manuals, the operator's fuel policy and the applicable regulations govern.",
];

export const SAFETY_NOTICE: string = SAFETY_NOTICE_LINES.join(' ');

/**
 * The notice as `#` comment lines for the top of an exported CSV file (the
 * same comment convention as the deck CSV), ending with a newline.
 */
export function noticeCsvComment(): string {
  return SAFETY_NOTICE_LINES.map((line) => `# ${line}\n`).join('');
}
