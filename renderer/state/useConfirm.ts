/**
 * An in-app question with two answers (Electron and the browser alike, so the
 * end-to-end tests see it): `ask` resolves true or false; `pending` is what
 * the dialog shows until it is answered.
 */
import { useCallback, useRef, useState } from 'react';

export interface ConfirmQuestion {
  readonly text: string;
  readonly confirmLabel: string;
}

export interface Confirm {
  readonly pending: ConfirmQuestion | null;
  ask(text: string, confirmLabel: string): Promise<boolean>;
  answer(yes: boolean): void;
}

export function useConfirm(): Confirm {
  const [pending, setPending] = useState<ConfirmQuestion | null>(null);
  const resolveRef = useRef<((yes: boolean) => void) | null>(null);
  const ask = useCallback((text: string, confirmLabel: string) => {
    resolveRef.current?.(false);
    setPending({ text, confirmLabel });
    return new Promise<boolean>((resolve) => {
      resolveRef.current = resolve;
    });
  }, []);
  const answer = useCallback((yes: boolean) => {
    resolveRef.current?.(yes);
    resolveRef.current = null;
    setPending(null);
  }, []);
  return { pending, ask, answer };
}
