import { Area, CartesianGrid, ComposedChart, Legend, Line, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import { chartColors } from './chart-colors';

export interface PositioningChartProps {
  /** Per target (mm): mean deviations and their s, in the display unit. */
  targets: { target: number; meanUp: number; meanDown: number; sUp: number; sDown: number }[];
  unitLabel: string;
  height?: number;
  /** Accessible name of the figure. */
  label?: string;
}

/** Mean positional deviation approaching each target up and down, with ±2s bands. */
export function PositioningChart({ targets, unitLabel, height = 320, label = 'Positioning chart' }: PositioningChartProps) {
  const rows = [...targets]
    .sort((a, b) => a.target - b.target)
    .map((t) => ({
      target: t.target,
      meanUp: t.meanUp,
      meanDown: t.meanDown,
      bandUp: [t.meanUp - 2 * t.sUp, t.meanUp + 2 * t.sUp] as [number, number],
      bandDown: [t.meanDown - 2 * t.sDown, t.meanDown + 2 * t.sDown] as [number, number],
    }));
  const fmt = (v: number) => Number(v.toPrecision(4)).toString();
  return (
    <figure aria-label={label} style={{ margin: 0 }}>
      <ResponsiveContainer width="100%" height={height}>
        <ComposedChart data={rows} margin={{ top: 8, right: 16, bottom: 24, left: 8 }}>
          <CartesianGrid stroke={chartColors.grid} />
          <XAxis
            type="number"
            dataKey="target"
            domain={['dataMin', 'dataMax']}
            ticks={rows.length <= 12 ? rows.map((r) => r.target) : undefined}
            tickFormatter={fmt} label={{ value: 'Target (mm)', position: 'insideBottom', offset: -12 }} />
          <YAxis tickFormatter={fmt} width={72} label={{ value: `Deviation (${unitLabel})`, angle: -90, position: 'insideLeft', offset: 4 }} />
          <Tooltip formatter={(v) => (Array.isArray(v) ? v.map((x) => fmt(Number(x))).join(' to ') : fmt(Number(v)))} labelFormatter={(l) => `Target ${fmt(Number(l))} mm`} />
          <Legend verticalAlign="top" height={28} itemSorter={null} />
          <Area dataKey="bandUp" name="Up ±2s" stroke="none" fill={chartColors.up} fillOpacity={0.15} isAnimationActive={false} />
          <Line dataKey="meanUp" name="Mean up" stroke={chartColors.up} strokeWidth={2} dot={{ r: 3 }} isAnimationActive={false} />
          <Area dataKey="bandDown" name="Down ±2s" stroke="none" fill={chartColors.down} fillOpacity={0.15} isAnimationActive={false} />
          <Line dataKey="meanDown" name="Mean down" stroke={chartColors.down} strokeWidth={2} dot={{ r: 3 }} isAnimationActive={false} />
        </ComposedChart>
      </ResponsiveContainer>
    </figure>
  );
}
