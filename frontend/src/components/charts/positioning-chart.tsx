import { Area, CartesianGrid, ComposedChart, Legend, Line, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import { chartColors } from './chart-colors';
import { niceAxis, tickText } from './nice-axis';
import { bandAround, targetBandArea, type TargetBand } from './target-band';

export interface PositioningChartProps {
  /** Per target (mm): mean deviations and their s, in the display unit. */
  targets: { target: number; meanUp: number; meanDown: number; sUp: number; sDown: number }[];
  /**
   * The positioning accuracy target (full width, display unit). ISO 230-2's accuracy A is the
   * spread from the lowest mean − 2s to the highest mean + 2s, so the zone is centred on that
   * spread: every ±2s band lies inside it exactly when A is within target.
   */
  target?: TargetBand | null;
  unitLabel: string;
  height?: number;
  /** Accessible name of the figure. */
  label?: string;
}

/** Mean positional deviation approaching each target up and down, with ±2s bands and the target zone. */
export function PositioningChart({
  targets,
  target,
  unitLabel,
  height = 320,
  label = 'Positioning chart',
}: PositioningChartProps) {
  const rows = [...targets]
    .sort((a, b) => a.target - b.target)
    .map((t) => ({
      target: t.target,
      meanUp: t.meanUp,
      meanDown: t.meanDown,
      bandUp: [t.meanUp - 2 * t.sUp, t.meanUp + 2 * t.sUp] as [number, number],
      bandDown: [t.meanDown - 2 * t.sDown, t.meanDown + 2 * t.sDown] as [number, number],
    }));
  const edges = rows.flatMap((r) => [...r.bandUp, ...r.bandDown]);
  const band = target ? bandAround(edges, target.width) : null;
  const x = niceAxis(rows.map((r) => r.target));
  const y = niceAxis([...edges, ...(band ?? [])]);
  return (
    <figure aria-label={label} style={{ margin: 0 }}>
      <ResponsiveContainer width="100%" height={height}>
        <ComposedChart data={rows} margin={{ top: 8, right: 16, bottom: 24, left: 8 }}>
          <CartesianGrid stroke={chartColors.grid} />
          <XAxis
            type="number"
            dataKey="target"
            domain={x.domain}
            ticks={x.ticks}
            tickFormatter={tickText}
            label={{ value: 'Target (mm)', position: 'insideBottom', offset: -12 }}
          />
          <YAxis
            type="number"
            domain={y.domain}
            ticks={y.ticks}
            tickFormatter={tickText}
            width={72}
            label={{ value: `Deviation (${unitLabel})`, angle: -90, position: 'insideLeft', offset: 4 }}
          />
          <Tooltip
            formatter={(v) => (Array.isArray(v) ? v.map((n) => tickText(Number(n))).join(' to ') : tickText(Number(v)))}
            labelFormatter={(l) => `Target ${tickText(Number(l))} mm`}
          />
          <Legend verticalAlign="top" itemSorter={null} />
          {band && target && targetBandArea(band, target.label)}
          <Area
            dataKey="bandUp"
            name="Up ±2s"
            stroke="none"
            fill={chartColors.up}
            fillOpacity={0.15}
            isAnimationActive={false}
          />
          <Line
            dataKey="meanUp"
            name="Mean up"
            stroke={chartColors.up}
            strokeWidth={2}
            dot={{ r: 3 }}
            isAnimationActive={false}
          />
          <Area
            dataKey="bandDown"
            name="Down ±2s"
            stroke="none"
            fill={chartColors.down}
            fillOpacity={0.15}
            isAnimationActive={false}
          />
          <Line
            dataKey="meanDown"
            name="Mean down"
            stroke={chartColors.down}
            strokeWidth={2}
            dot={{ r: 3 }}
            isAnimationActive={false}
          />
        </ComposedChart>
      </ResponsiveContainer>
    </figure>
  );
}
