/** Says that the figures shown are from before the latest edit. */
export function StaleMark(props: { readonly stale: boolean; readonly running: boolean }) {
  if (!props.stale) return null;
  return (
    <p className="stale-mark" data-testid="results-stale" role="status">
      {props.running ? 'Updating: figures below are from before the latest edit.' : 'Out of date: figures below are from the last project that could be flown.'}
    </p>
  );
}
