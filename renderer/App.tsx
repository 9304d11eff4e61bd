import { useState } from 'react';
import { SafetyNotice } from './components/SafetyNotice';
import { ViewTabs } from './components/ViewTabs';
import type { ViewId } from './state/viewNames';

/**
 * The application shell: tab bar, the current view, the safety notice.
 * Views live in renderer/views/; state in renderer/state/.
 */
export function App() {
  const [view, setView] = useState<ViewId>('results');
  return (
    <div className="app">
      <header className="app-header">
        <h1>Blockwise</h1>
        <ViewTabs current={view} onSelect={setView} />
      </header>
      <main className="view" data-testid={`view-${view}`} />
      <SafetyNotice />
    </div>
  );
}
