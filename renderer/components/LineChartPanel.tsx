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

/** Thickness (px) of a mark's label across its line (10 px text and its leading). */
const MARK_LABEL_PX = 13;

/**
 * The label drawn beside each mark, or null: marks whose lines lie closer than
 * a label's thickness to the first line of their group share one label on
 * that line, repeated labels said once ("absolute / service / cruise
 * ceiling", "leg 5 / 6 / 7"), so marks a few pixels apart do not print over
 * each other. `pxPerUnit` converts the axis unit to pixels (an underestimate
 * only groups more); horizontal marks are grouped from the top down, vertical
 * ones from the left.
 */
export function markLabels(marks: readonly { readonly at: number; readonly label: string }[], pxPerUnit: number, from: 'top' | 'left'): (string | null)[] {
  const sign = from === 'top' ? -1 : 1;
  const order = marks.map((_, i) => i).sort((a, b) => sign * (marks[a].at - marks[b].at));
  const out: (string | null)[] = marks.map(() => null);
  let i = 0;
  while (i < order.length) {
    const first = order[i];
    const group = [first];
    let j = i + 1;
    while (j < order.length && Math.abs(marks[order[j]].at - marks[first].at) * pxPerUnit < MARK_LABEL_PX) group.push(order[j++]);
    out[first] = sharedLabel([...new Set(group.map((k) => marks[k].label))]);
    i = j;
  }
  return out;
}

/** Labels joined with " / ", a first or last word they all share said once ("leg 5", "leg 6" -> "leg 5 / 6"). */
function sharedLabel(labels: readonly string[]): string {
  if (labels.length === 1) return labels[0];
  const words = labels.map((l) => l.split(' '));
  if (words.every((w) => w.length > 1)) {
    const last = words[0][words[0].length - 1];
    if (words.every((w) => w[w.length - 1] === last)) return `${words.map((w) => w.slice(0, -1).join(' ')).join(' / ')} ${last}`;
    const head = words[0][0];
    if (words.every((w) => w[0] === head)) return `${head} ${words.map((w) => w.slice(1).join(' ')).join(' / ')}`;
  }
  return labels.join(' / ');
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
  // The plot takes about four fifths of the panel's width and somewhat more than half its height (axes, legend and
  // margins take the rest): marks closer than a label's thickness share one label.
  const perUnit = (axis: NiceAxis | null, px: number) => (axis === null ? 0 : px / Math.max(axis.domain[1] - axis.domain[0], Number.MIN_VALUE));
  const vLabels = markLabels(marks.map((m) => ({ at: m.x, label: m.label })), perUnit(xAxis, 0.8 * size.width), 'left');
  const pointKey = markKeys(points);
  const hLabels = markLabels(hMarks.map((m) => ({ at: m.y, label: m.label })), perUnit(leftAxis, 0.55 * size.height), 'top');
  return (
    <figure className="chart" data-testid={props.testId}>
      <figcaption>{props.title}</figcaption>
      <LineChart accessibilityLayer={false} role="img" aria-label={props.title} width={size.width} height={size.height} data={props.data as object[]} margin={{ top: 8, right: 24, bottom: 8, left: 16 }}>
        <CartesianGrid strokeDasharray="3 3" />
        <XAxis dataKey={props.xKey} type="number" {...axisTicks(xAxis)} interval={0} tickFormatter={tickText} label={{ value: props.xLabel, position: 'insideBottom', offset: -12 }} />
        <YAxis yAxisId="left" label={{ value: props.yLabel, angle: -90, position: 'insideLeft', style: { textAnchor: 'middle' } }} {...axisTicks(leftAxis)} interval={0} tickFormatter={tickText} width={76} />
        {second.size > 0 ? <YAxis yAxisId="right" orientation="right" label={{ value: props.secondAxisLabel ?? '', angle: 90, position: 'insideRight', style: { textAnchor: 'middle' } }} {...axisTicks(rightAxis)} interval={0} tickFormatter={tickText} width={76} /> : null}
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
          <ReferenceLine key={markKey[i]} yAxisId="left" x={m.x} stroke="#888" strokeDasharray="2 2" label={vLabels[i] !== null ? { value: vLabels[i], position: 'insideTopLeft', fontSize: 10, angle: -90, dx: 4, dy: 70 } : undefined} />
        ))}
        {hMarks.map((m, i) => (
          <ReferenceLine key={`h-${m.label}-${m.y}-${i}`} yAxisId="left" y={m.y} stroke="#555" strokeDasharray="4 2" label={hLabels[i] === null ? undefined : { value: hLabels[i], position: 'insideTopRight', fontSize: 10 }} />
        ))}
        {points.map((p, i) => (
          <ReferenceDot key={pointKey[i]} yAxisId="left" x={p.x} y={p.y} r={4} fill="#c00" stroke="none" />
        ))}
      </LineChart>
    </figure>
  );
}
