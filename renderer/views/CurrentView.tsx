import type { ChartSize } from '../components/LineChartPanel';
import type { ToolbarCommand } from '../components/Toolbar';
import type { ViewId } from '../state/viewNames';
import type { LiveStudy } from '../worker/useEngine';
import { AirframeView } from './AirframeView';
import { CautionsView } from './CautionsView';
import { CompareView } from './CompareView';
import { CrossoverView } from './CrossoverView';
import { EngineView } from './EngineView';
import { EnvelopeView } from './EnvelopeView';
import { InletsView } from './InletsView';
import { MissionView } from './MissionView';
import { ResultsView } from './ResultsView';
import { SpecificRangeView } from './SpecificRangeView';
import { SweepView } from './SweepView';

/** The view for a tab. */
export function CurrentView(props: { readonly view: ViewId; readonly live: LiveStudy; readonly chartSize?: ChartSize; readonly onCommand: (command: ToolbarCommand) => void; readonly hostKind?: 'desktop' | 'browser'; readonly onExportText?: (text: string, name: string) => void }) {
  const common = { live: props.live, ...(props.chartSize ? { chartSize: props.chartSize } : {}) };
  switch (props.view) {
    case 'airframe':
      return <AirframeView {...common} />;
    case 'engine':
      return <EngineView {...common} onCommand={props.onCommand} hostKind={props.hostKind ?? 'browser'} />;
    case 'inlets':
      return <InletsView {...common} />;
    case 'mission':
      return <MissionView />;
    case 'cautions':
      return <CautionsView />;
    case 'results':
      return <ResultsView {...common} />;
    case 'crossover':
      return <CrossoverView {...common} />;
    case 'envelope':
      return <EnvelopeView {...common} />;
    case 'specificRange':
      return <SpecificRangeView {...common} />;
    case 'compare':
      return <CompareView {...common} />;
    case 'sweep':
      return <SweepView {...common} {...(props.onExportText ? { onExportText: props.onExportText } : {})} />;
  }
}
