import {
  CartesianGrid,
  ComposedChart,
  Legend,
  Line,
  ResponsiveContainer,
  Scatter,
  Tooltip,
  XAxis,
  YAxis,
} from 'recharts';
import { chartColors } from './chart-colors';
import { niceAxis, tickText } from './nice-axis';

export interface BoltDownChartProps {
  /** Readings at the fixed holes: mm along the rail, reading in the display unit. */
  fixed: { position: number; reading: number }[];
  /** Every hole position (mm), drawn as ticks so the open holes can be seen. */
  holePositions: number[];
  /** Aim at the hole being fixed, in the display unit. */
  aim?: { position: number; reading: number } | null;
  lengthMm: number;
  unitLabel: string;
  height?: number;
  label?: string;
}

/** Readings of the holes fixed so far along the rail, and the aim at the hole being fixed. */
export function BoltDownChart({
  fixed,
  holePositions,
  aim,
  lengthMm,
  unitLabel,
  height = 220,
  label = 'Fixed readings along the rail',
}: BoltDownChartProps) {
  const points = [...fixed].sort((a, b) => a.position - b.position);
  const fmt = tickText;
  const values = [...points.map((p) => p.reading), ...(aim ? [aim.reading] : [])];
  const lo = values.length ? Math.min(...values) : -1;
  const hi = values.length ? Math.max(...values) : 1;
  const pad = Math.max((hi - lo) * 0.2, 0.5);
  const x = niceAxis([0, lengthMm]);
  const y = niceAxis([lo - pad, hi + pad]);
  // The open holes sit on the bottom edge, so the spacing still to fill can be seen.
  const floor = y.domain[0];
  return (
    <figure aria-label={label} style={{ margin: 0 }}>
      <ResponsiveContainer width="100%" height={height}>
        <ComposedChart margin={{ top: 8, right: 16, bottom: 24, left: 8 }}>
          <CartesianGrid stroke={chartColors.grid} />
          <XAxis
            type="number"
            dataKey="position"
            domain={x.domain}
            ticks={x.ticks}
            tickFormatter={fmt}
            label={{ value: 'Along the rail (mm)', position: 'insideBottom', offset: -12 }}
          />
          <YAxis
            type="number"
            dataKey="reading"
            domain={y.domain}
            ticks={y.ticks}
            tickFormatter={fmt}
            width={64}
            label={{ value: unitLabel, angle: -90, position: 'insideLeft', offset: 8 }}
          />
          <Tooltip formatter={(v) => `${fmt(Number(v))} ${unitLabel}`} labelFormatter={(l) => `${fmt(Number(l))} mm`} />
          <Legend verticalAlign="top" height={28} />
          <Scatter
            name="Holes"
            data={holePositions.map((position) => ({ position, reading: floor }))}
            fill={chartColors.grid}
            shape="diamond"
            legendType="none"
            tooltipType="none"
            isAnimationActive={false}
          />
          <Line
            data={points}
            dataKey="reading"
            name="Fixed reading"
            stroke={chartColors.reading}
            strokeWidth={2}
            dot={{ r: 3 }}
            isAnimationActive={false}
          />
          {aim && (
            <Scatter
              name="Aim at this hole"
              data={[aim]}
              fill={chartColors.band}
              shape="star"
              isAnimationActive={false}
            />
          )}
        </ComposedChart>
      </ResponsiveContainer>
    </figure>
  );
}
