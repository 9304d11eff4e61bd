import { VIEWS, type ViewId } from '../state/viewNames';

export function ViewTabs(props: { readonly current: ViewId; readonly onSelect: (view: ViewId) => void }) {
  return (
    <nav className="view-tabs" role="tablist">
      {VIEWS.map((v) => (
        <button
          key={v.id}
          role="tab"
          aria-selected={props.current === v.id}
          data-testid={`view-tab-${v.id}`}
          onClick={() => props.onSelect(v.id)}
        >
          {v.label}
        </button>
      ))}
    </nav>
  );
}
