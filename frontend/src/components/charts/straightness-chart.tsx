import { Area, CartesianGrid, ComposedChart, Legend, Line, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import { chartColors } from './chart-colors';

export interface StraightnessChartProps {
  /** Stations (mm along the rail) and readings in the display unit. */
  points: { position: number; reading: number }[];
  /** Least-squares line, reading = slope · position + intercept, in the display unit. */
  leastSquares: { slope: number; intercept: number };
  /** Minimum-zone band: centre line and full width, in the display unit. */
  zone: { slope: number; intercept: number; width: number };
  unitLabel: string;
  height?: number;
  /** Accessible name of the figure. */
  label?: string;
}

/** Readings along a rail with the least-squares line and the minimum-zone band. */
export function StraightnessChart({ points, leastSquares, zone, unitLabel, height = 320, label = 'Straightness chart' }: StraightnessChartProps) {
  const rows = [...points]
    .sort((a, b) => a.position - b.position)
    .map((p) => {
      const centre = zone.slope * p.position + zone.intercept;
      return {
        position: p.position,
        reading: p.reading,
        leastSquares: leastSquares.slope * p.position + leastSquares.intercept,
        zone: [centre - zone.width / 2, centre + zone.width / 2] as [number, number],
      };
    });
  const fmt = (v: number) => Number(v.toPrecision(4)).toString();
  return (
    <figure aria-label={label} style={{ margin: 0 }}>
      <ResponsiveContainer width="100%" height={height}>
        <ComposedChart data={rows} margin={{ top: 8, right: 16, bottom: 24, left: 8 }}>
          <CartesianGrid stroke={chartColors.grid} />
          <XAxis
            type="number"
            dataKey="position"
            domain={['dataMin', 'dataMax']}
            tickFormatter={fmt}
            label={{ value: 'Station (mm)', position: 'insideBottom', offset: -12 }}
          />
          <YAxis tickFormatter={fmt} width={72} label={{ value: `Reading (${unitLabel})`, angle: -90, position: 'insideLeft', offset: 4 }} />
          <Tooltip formatter={(v) => (Array.isArray(v) ? v.map((x) => fmt(Number(x))).join(' to ') : fmt(Number(v)))} labelFormatter={(l) => `Station ${fmt(Number(l))} mm`} />
          <Legend verticalAlign="top" height={28} itemSorter={null} />
          <Area
            dataKey="zone"
            name="Minimum zone"
            stroke={chartColors.band}
            fill={chartColors.band}
            fillOpacity={0.18}
            strokeDasharray="4 3"
            isAnimationActive={false}
          />
          <Line dataKey="leastSquares" name="Least-squares line" stroke={chartColors.fit} strokeDasharray="6 4" dot={false} isAnimationActive={false} />
          <Line dataKey="reading" name={`Reading (${unitLabel})`} stroke={chartColors.reading} strokeWidth={2} dot={{ r: 3 }} isAnimationActive={false} />
        </ComposedChart>
      </ResponsiveContainer>
    </figure>
  );
}
