import { render, screen, waitFor } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { SAFETY_NOTICE_LINES } from '../../../engine/core/notice';
import { App } from '../../../renderer/App';
import { createInThreadClient } from '../../../renderer/worker/engineClient';
import { createFakeBridge } from '../support/fakeBridge';

const SIZE = { width: 400, height: 200 };

describe('ResultsView in the App', () => {
  it('flies the demo project and shows the headline figures, legs and the notice', async () => {
    render(<App bridge={createFakeBridge()} engine={createInThreadClient()} chartSize={SIZE} />);
    const blockFuel = await screen.findByTestId('headline-block-fuel', {}, { timeout: 10000 });
    expect(blockFuel.textContent).toMatch(/^[\d,]+ lb$/);
    expect(screen.getByTestId('legs-table')).toBeInTheDocument();
    expect(screen.getByTestId('mission-status').textContent).toContain('Mission status: flown');
    for (const line of SAFETY_NOTICE_LINES) expect(screen.getByTestId('safety-notice').textContent).toContain(line);
    await waitFor(() => expect(screen.getByTestId('chart-altitude').querySelector('svg')).not.toBeNull(), { timeout: 15000 });
  }, 30000);
});
