import { useRef, type KeyboardEvent } from 'react';
import { VIEWS, type ViewId } from '../state/viewNames';

/** The index a key moves to in a tab list of `count` (WAI-ARIA tabs pattern: arrows wrap, Home and End), or null. */
export function tabKeyTarget(key: string, index: number, count: number): number | null {
  switch (key) {
    case 'ArrowRight':
      return (index + 1) % count;
    case 'ArrowLeft':
      return (index - 1 + count) % count;
    case 'Home':
      return 0;
    case 'End':
      return count - 1;
    default:
      return null;
  }
}

/**
 * The view tabs: one Tab stop (the selected tab), arrow keys, Home and End
 * move and select; each tab controls the view panel.
 */
export function ViewTabs(props: { readonly current: ViewId; readonly onSelect: (view: ViewId) => void }) {
  const refs = useRef<(HTMLButtonElement | null)[]>([]);
  const onKey = (event: KeyboardEvent<HTMLButtonElement>, index: number) => {
    const next = tabKeyTarget(event.key, index, VIEWS.length);
    if (next === null) return;
    event.preventDefault();
    props.onSelect(VIEWS[next]!.id);
    refs.current[next]?.focus();
  };
  return (
    <div className="view-tabs" role="tablist" aria-label="Views">
      {VIEWS.map((v, k) => {
        const selected = props.current === v.id;
        return (
          <button
            key={v.id}
            ref={(el) => {
              refs.current[k] = el;
            }}
            type="button"
            role="tab"
            id={`tab-${v.id}`}
            aria-selected={selected}
            aria-controls="view-panel"
            tabIndex={selected ? 0 : -1}
            data-testid={`view-tab-${v.id}`}
            onClick={() => props.onSelect(v.id)}
            onKeyDown={(e) => onKey(e, k)}
          >
            {v.label}
          </button>
        );
      })}
    </div>
  );
}
