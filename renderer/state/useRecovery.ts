/**
 * Crash recovery through the bridge: unsaved work is sent for safekeeping
 * every few seconds while the document is dirty (renderer/bridge/autosaveTimer.ts),
 * and an earlier session's unsaved work is offered back at start.
 */
import { useCallback, useEffect, useRef, useState } from 'react';
import { startAutosave } from '../bridge/autosaveTimer';
import type { Bridge, RecoveryOffer } from '../bridge/bridge';
import { openProjectAction } from './documentActions';
import { projectSaveText } from './saveText';
import type { StudyStore } from './studyContext';

export function useRecovery(bridge: Bridge, store: StudyStore) {
  const { state, dispatch } = store;
  const [offer, setOffer] = useState<RecoveryOffer | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const latest = useRef(state);
  latest.current = state;

  useEffect(() => {
    let live = true;
    bridge.recoveryOffer().then(
      (o) => live && setOffer(o),
      () => undefined,
    );
    return () => {
      live = false;
    };
  }, [bridge]);

  useEffect(
    () =>
      startAutosave(
        bridge,
        () => {
          const s = latest.current;
          // The recovery copy is what a save would write, so in the browser build it carries the deck too.
          const text = projectSaveText(s, bridge.kind);
          if (s.doc === null || text === null) return null;
          return { name: s.documentName, text, dirty: s.savedAtStep !== s.doc.past.length };
        },
        (e) => setProblem(`Could not keep a recovery copy: ${e instanceof Error ? e.message : String(e)}`),
      ),
    [bridge],
  );

  const restore = useCallback(() => {
    if (offer === null) return;
    const action = openProjectAction(offer.name, offer.text, latest.current.deckFile);
    dispatch(action.type === 'projectOpened' ? { ...action, unsaved: true } : action);
    setOffer(null);
  }, [offer, dispatch]);

  const discard = useCallback(() => {
    setOffer(null);
    bridge.discardRecovery().catch((e: unknown) => setProblem(e instanceof Error ? e.message : String(e)));
  }, [bridge]);

  return { offer, problem, restore, discard };
}
