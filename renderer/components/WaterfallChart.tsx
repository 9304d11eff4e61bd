import { Bar, BarChart, CartesianGrid, Cell, ReferenceLine, Tooltip, XAxis, YAxis } from 'recharts';
import type { WaterfallRow } from '../charts/compareSeries';
import { tickText } from '../charts/seriesKeys';
import { groupDigits } from '../../engine/units';
import { DEFAULT_CHART_SIZE, type ChartSize } from './LineChartPanel';

/** Block-fuel breakdown as a waterfall: an invisible base bar stacked under the visible step. */
export function WaterfallChart(props: { readonly rows: readonly WaterfallRow[]; readonly unit: string; readonly size?: ChartSize }) {
  const size = props.size ?? DEFAULT_CHART_SIZE;
  return (
    <figure className="chart" data-testid="chart-breakdown">
      <figcaption>Block fuel B - A by factor ({props.unit}); positive costs fuel</figcaption>
      <BarChart accessibilityLayer={false} role="img" aria-label="Block fuel B - A by factor" width={size.width} height={size.height} data={props.rows as WaterfallRow[]} margin={{ top: 8, right: 24, bottom: 8, left: 16 }}>
        <CartesianGrid strokeDasharray="3 3" />
        {/* Every factor keeps its label (recharts would skip some): angled so long names fit. */}
        <XAxis dataKey="name" interval={0} angle={-20} textAnchor="end" height={56} tick={{ fontSize: 11 }} />
        <YAxis label={{ value: props.unit, angle: -90, position: 'insideLeft' }} tickFormatter={tickText} width={64} />
        <Tooltip formatter={(_v, _n, item) => [`${groupDigits((item.payload as WaterfallRow).value, 1)} ${props.unit}`, 'B - A']} />
        <ReferenceLine y={0} stroke="#000" />
        <Bar dataKey="base" stackId="w" fill="transparent" isAnimationActive={false} />
        <Bar dataKey="height" stackId="w" isAnimationActive={false}>
          {props.rows.map((r) => (
            <Cell key={r.name} fill={r.total ? '#555555' : r.value > 0 ? '#c2571a' : '#2e8540'} />
          ))}
        </Bar>
      </BarChart>
    </figure>
  );
}
