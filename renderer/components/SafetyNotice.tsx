import { SAFETY_NOTICE_LINES } from '../../engine/core';

/** The notice every screen carries (DESIGN.md §7); always in the footer. */
export function SafetyNotice() {
  return (
    <footer className="safety-notice" data-testid="safety-notice" role="note">
      {SAFETY_NOTICE_LINES.map((line) => (
        <span key={line}>{line} </span>
      ))}
    </footer>
  );
}
