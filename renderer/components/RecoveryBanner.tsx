import type { RecoveryOffer } from '../bridge/bridge';

/** Offers back unsaved work from an earlier session. */
export function RecoveryBanner(props: { readonly offer: RecoveryOffer | null; readonly onRestore: () => void; readonly onDiscard: () => void }) {
  if (props.offer === null) return null;
  return (
    <p className="recovery-banner" data-testid="recovery-offer" role="status">
      Unsaved work on {props.offer.name} from {new Date(props.offer.savedAt_ms).toISOString().slice(0, 16).replace('T', ' ')} UTC was kept.{' '}
      <button type="button" data-testid="recovery-restore" onClick={props.onRestore}>
        Restore it
      </button>{' '}
      <button type="button" data-testid="recovery-discard" onClick={props.onDiscard}>
        Discard it
      </button>
    </p>
  );
}
