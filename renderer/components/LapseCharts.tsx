import type { lapseSeries } from '../charts/lapseSeries';
import { LineChartPanel, type ChartSize } from './LineChartPanel';

type Lapse = ReturnType<typeof lapseSeries>;

/** Uninstalled series are drawn dashed, installed solid (the keys lapseSeries gives). */
function isUninstalled(key: string): boolean {
  return key.startsWith('u');
}

/** Thrust against Mach at one rating, uninstalled (dashed) and installed, as the engine view and the report show it. */
export function ThrustLapseChart(props: { readonly lapse: Lapse; readonly title: string; readonly testId: string; readonly size?: ChartSize }) {
  return (
    <LineChartPanel
      title={props.title}
      testId={props.testId}
      data={props.lapse.thrust}
      xKey="mach"
      xLabel="Mach"
      yLabel={`thrust (${props.lapse.thrustUnit})`}
      series={props.lapse.series}
      dashed={isUninstalled}
      {...(props.size ? { size: props.size } : {})}
    />
  );
}

/** TSFC against Mach at the same rating, uninstalled (dashed) and installed. */
export function TsfcLapseChart(props: { readonly lapse: Lapse; readonly title: string; readonly testId: string; readonly size?: ChartSize }) {
  return (
    <LineChartPanel
      title={props.title}
      testId={props.testId}
      data={props.lapse.tsfc}
      xKey="mach"
      xLabel="Mach"
      yLabel={`TSFC (${props.lapse.tsfcUnit})`}
      series={props.lapse.series}
      dashed={isUninstalled}
      {...(props.size ? { size: props.size } : {})}
    />
  );
}
