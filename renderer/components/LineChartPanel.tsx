import { CartesianGrid, Legend, Line, LineChart, ReferenceDot, ReferenceLine, Tooltip, XAxis, YAxis } from 'recharts';
import type { SeriesDef } from '../charts/polarSeries';
import { tickText } from '../charts/seriesKeys';

const PALETTE = ['#1f5fa8', '#c2571a', '#2e8540', '#8a3fa0', '#a8871f', '#1f9aa8', '#a81f4a', '#555555', '#6b8e23', '#d2691e'];

export interface ChartSize {
  readonly width: number;
  readonly height: number;
}

/** The size charts use in the app; tests pass their own. */
export const DEFAULT_CHART_SIZE: ChartSize = { width: 640, height: 360 };

export interface LineChartPanelProps {
  readonly title: string;
  readonly testId: string;
  readonly data: readonly object[];
  readonly xKey: string;
  readonly xLabel: string;
  readonly yLabel: string;
  readonly series: readonly SeriesDef[];
  readonly size?: ChartSize;
  /** Dashed series (e.g. uninstalled thrust) by key. */
  readonly dashed?: (key: string) => boolean;
  readonly verticalMarks?: readonly { readonly x: number; readonly label: string }[];
  readonly points?: readonly { readonly x: number; readonly y: number; readonly label: string }[];
  readonly secondAxisKeys?: readonly string[];
  readonly secondAxisLabel?: string;
}

/** A titled line chart with fixed width and height (recharts needs a size without layout). */
export function LineChartPanel(props: LineChartPanelProps) {
  const size = props.size ?? DEFAULT_CHART_SIZE;
  const second = new Set(props.secondAxisKeys ?? []);
  return (
    <figure className="chart" data-testid={props.testId}>
      <figcaption>{props.title}</figcaption>
      <LineChart width={size.width} height={size.height} data={props.data as object[]} margin={{ top: 8, right: 24, bottom: 8, left: 16 }}>
        <CartesianGrid strokeDasharray="3 3" />
        <XAxis dataKey={props.xKey} type="number" domain={['auto', 'auto']} tickFormatter={tickText} label={{ value: props.xLabel, position: 'insideBottom', offset: -12 }} />
        <YAxis yAxisId="left" label={{ value: props.yLabel, angle: -90, position: 'insideLeft' }} domain={['auto', 'auto']} tickFormatter={tickText} width={64} />
        {second.size > 0 ? <YAxis yAxisId="right" orientation="right" label={{ value: props.secondAxisLabel ?? '', angle: 90, position: 'insideRight' }} /> : null}
        <Tooltip formatter={(v) => (typeof v === 'number' ? tickText(v) : String(v))} labelFormatter={(v) => (typeof v === 'number' ? tickText(v) : String(v))} />
        <Legend verticalAlign="bottom" wrapperStyle={{ paddingTop: 28, fontSize: 11 }} />
        {props.series.map((s, i) => (
          <Line
            key={s.key}
            yAxisId={second.has(s.key) ? 'right' : 'left'}
            type="monotone"
            dataKey={s.key}
            name={s.name}
            stroke={PALETTE[(s.colorIndex ?? i) % PALETTE.length]}
            strokeDasharray={props.dashed?.(s.key) ? '5 4' : undefined}
            dot={false}
            isAnimationActive={false}
            connectNulls={false}
          />
        ))}
        {(props.verticalMarks ?? []).map((m) => (
          <ReferenceLine key={`${m.label}-${m.x}`} yAxisId="left" x={m.x} stroke="#888" strokeDasharray="2 2" label={{ value: m.label, position: 'insideTopLeft', fontSize: 10, angle: -90, dx: 4, dy: 70 }} />
        ))}
        {(props.points ?? []).map((p) => (
          <ReferenceDot key={`${p.label}-${p.x}`} yAxisId="left" x={p.x} y={p.y} r={4} fill="#c00" stroke="none" />
        ))}
      </LineChart>
    </figure>
  );
}
