import { useEffect, useRef } from 'react';
import type { ConfirmQuestion } from '../state/useConfirm';

/** A modal question: Escape or "Cancel" answers no; focus starts on "Cancel" so Enter never discards by accident. */
export function ConfirmDialog(props: { readonly question: ConfirmQuestion | null; readonly onAnswer: (yes: boolean) => void }) {
  const cancelRef = useRef<HTMLButtonElement>(null);
  useEffect(() => {
    if (props.question !== null) cancelRef.current?.focus();
  }, [props.question]);
  if (props.question === null) return null;
  return (
    <div className="dialog-backdrop">
      <div
        role="alertdialog"
        aria-modal="true"
        aria-labelledby="confirm-text"
        className="dialog"
        data-testid="confirm-dialog"
        onKeyDown={(e) => {
          if (e.key === 'Escape') props.onAnswer(false);
        }}
      >
        <p id="confirm-text">{props.question.text}</p>
        <div className="dialog-buttons">
          <button type="button" ref={cancelRef} data-testid="confirm-cancel" onClick={() => props.onAnswer(false)}>
            Cancel
          </button>
          <button type="button" data-testid="confirm-yes" onClick={() => props.onAnswer(true)}>
            {props.question.confirmLabel}
          </button>
        </div>
      </div>
    </div>
  );
}
