import { CartesianGrid, Legend, Line, LineChart, ReferenceDot, ReferenceLine, Tooltip, XAxis, YAxis } from 'recharts';
import type { SeriesDef } from '../charts/polarSeries';
import { niceTicks, numericExtent, type NiceAxis } from '../charts/niceTicks';
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
  /** Horizontal marks on the left axis (e.g. ceilings), labelled. */
  readonly horizontalMarks?: readonly { readonly y: number; readonly label: string }[];
  /**
   * Each series is drawn through its own points in data order, across rows
   * where it is null (boundaries of a y against x plot, which need not be
   * single-valued in x); straight segments.
   */
  readonly pathsInDataOrder?: boolean;
}

/** recharts props for an axis with round ticks (Heckbert's nice numbers), or its automatic axis when there is no data. */
function axisTicks(axis: NiceAxis | null): { ticks?: number[]; domain: [number, number] | ['auto', 'auto'] } {
  return axis === null ? { domain: ['auto', 'auto'] } : { ticks: [...axis.ticks], domain: [axis.domain[0], axis.domain[1]] };
}

/**
 * React keys for chart marks: label, position and the mark's index, so two
 * inlets marking the same point at the same Mach do not share a key.
 */
export function markKeys(marks: readonly { readonly x: number; readonly label: string }[]): string[] {
  return marks.map((m, i) => `${m.label}-${m.x}-${i}`);
}

/**
 * Whether each mark's label is drawn: a label equal to one already drawn
 * within `near` (x units) is left off, so two inlets' crossovers a few
 * thousandths of Mach apart do not print their names over each other.
 */
export function markLabelShown(marks: readonly { readonly x: number; readonly label: string }[], near: number): boolean[] {
  const drawn: { x: number; label: string }[] = [];
  return marks.map((m) => {
    const clash = drawn.some((d) => d.label === m.label && Math.abs(d.x - m.x) <= near);
    if (!clash) drawn.push({ x: m.x, label: m.label });
    return !clash;
  });
}

/** A titled line chart with fixed width and height (recharts needs a size without layout). */
export function LineChartPanel(props: LineChartPanelProps) {
  const size = props.size ?? DEFAULT_CHART_SIZE;
  const second = new Set(props.secondAxisKeys ?? []);
  const marks = props.verticalMarks ?? [];
  const points = props.points ?? [];
  const leftKeys = props.series.filter((s) => !second.has(s.key)).map((s) => s.key);
  const rightKeys = props.series.filter((s) => second.has(s.key)).map((s) => s.key);
  const xAxis = niceTicks(...numericExtent(props.data, [props.xKey], [...marks.map((m) => m.x), ...points.map((p) => p.x)]));
  const hMarks = props.horizontalMarks ?? [];
  const leftAxis = niceTicks(...numericExtent(props.data, leftKeys, [...points.map((p) => p.y), ...hMarks.map((m) => m.y)]));
  const rightAxis = niceTicks(...numericExtent(props.data, rightKeys));
  const markKey = markKeys(marks);
  // Same-label marks closer than 3 % of the axis share one label.
  const labelShown = markLabelShown(marks, xAxis === null ? 0 : 0.03 * (xAxis.domain[1] - xAxis.domain[0]));
  const pointKey = markKeys(points);
  return (
    <figure className="chart" data-testid={props.testId}>
      <figcaption>{props.title}</figcaption>
      <LineChart accessibilityLayer={false} role="img" aria-label={props.title} width={size.width} height={size.height} data={props.data as object[]} margin={{ top: 8, right: 24, bottom: 8, left: 16 }}>
        <CartesianGrid strokeDasharray="3 3" />
        <XAxis dataKey={props.xKey} type="number" {...axisTicks(xAxis)} interval={0} tickFormatter={tickText} label={{ value: props.xLabel, position: 'insideBottom', offset: -12 }} />
        <YAxis yAxisId="left" label={{ value: props.yLabel, angle: -90, position: 'insideLeft' }} {...axisTicks(leftAxis)} interval={0} tickFormatter={tickText} width={64} />
        {second.size > 0 ? <YAxis yAxisId="right" orientation="right" label={{ value: props.secondAxisLabel ?? '', angle: 90, position: 'insideRight' }} {...axisTicks(rightAxis)} interval={0} tickFormatter={tickText} width={64} /> : null}
        <Tooltip formatter={(v) => (typeof v === 'number' ? tickText(v) : String(v))} labelFormatter={(v) => (typeof v === 'number' ? tickText(v) : String(v))} />
        <Legend verticalAlign="bottom" wrapperStyle={{ paddingTop: 28, fontSize: 11 }} />
        {props.series.map((s, i) => (
          <Line
            key={s.key}
            yAxisId={second.has(s.key) ? 'right' : 'left'}
            type={props.pathsInDataOrder ? 'linear' : 'monotone'}
            dataKey={s.key}
            name={s.name}
            stroke={PALETTE[(s.colorIndex ?? i) % PALETTE.length]}
            strokeDasharray={props.dashed?.(s.key) ? '5 4' : undefined}
            dot={false}
            isAnimationActive={false}
            connectNulls={props.pathsInDataOrder === true}
          />
        ))}
        {marks.map((m, i) => (
          <ReferenceLine key={markKey[i]} yAxisId="left" x={m.x} stroke="#888" strokeDasharray="2 2" label={labelShown[i] ? { value: m.label, position: 'insideTopLeft', fontSize: 10, angle: -90, dx: 4, dy: 70 } : undefined} />
        ))}
        {hMarks.map((m, i) => (
          <ReferenceLine key={`h-${m.label}-${m.y}-${i}`} yAxisId="left" y={m.y} stroke="#555" strokeDasharray="4 2" label={{ value: m.label, position: 'insideTopRight', fontSize: 10 }} />
        ))}
        {points.map((p, i) => (
          <ReferenceDot key={pointKey[i]} yAxisId="left" x={p.x} y={p.y} r={4} fill="#c00" stroke="none" />
        ))}
      </LineChart>
    </figure>
  );
}
