import { Area, CartesianGrid, ComposedChart, Legend, Line, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import { chartColors } from './chart-colors';
import { niceAxis, tickText } from './nice-axis';

export interface StraightnessChartProps {
  /** Stations (mm along the rail) and readings in the display unit. */
  points: { position: number; reading: number }[];
  /** Least-squares line, reading = slope · position + intercept, in the display unit. */
  leastSquares: { slope: number; intercept: number };
  /** Minimum-zone band: centre line and full width, in the display unit. */
  zone: { slope: number; intercept: number; width: number };
  /**
   * The straightness target as a zone of its full width in the display unit, about the line the
   * target is judged on: the readings all lie inside it exactly when the result is within target.
   */
  target?: { width: number; reference: 'least-squares' | 'minimum-zone'; label: string } | null;
  unitLabel: string;
  height?: number;
  /** Accessible name of the figure. */
  label?: string;
}

/** Readings along a rail with the least-squares line, the minimum-zone band and the target zone. */
export function StraightnessChart({
  points,
  leastSquares,
  zone,
  target,
  unitLabel,
  height = 320,
  label = 'Straightness chart',
}: StraightnessChartProps) {
  const sorted = [...points].sort((a, b) => a.position - b.position);
  const ls = (x: number) => leastSquares.slope * x + leastSquares.intercept;
  const mz = (x: number) => zone.slope * x + zone.intercept;
  // About the least-squares line the zone is centred midway between the extreme residuals.
  const residuals = sorted.map((p) => p.reading - ls(p.position));
  const lsCentre = residuals.length ? (Math.min(...residuals) + Math.max(...residuals)) / 2 : 0;
  const targetCentre = (x: number) => (target?.reference === 'least-squares' ? ls(x) + lsCentre : mz(x));
  const rows = sorted.map((p) => {
    const centre = mz(p.position);
    return {
      position: p.position,
      reading: p.reading,
      leastSquares: ls(p.position),
      zone: [centre - zone.width / 2, centre + zone.width / 2] as [number, number],
      target: target
        ? ([targetCentre(p.position) - target.width / 2, targetCentre(p.position) + target.width / 2] as [
            number,
            number,
          ])
        : undefined,
    };
  });
  const x = niceAxis(rows.map((r) => r.position));
  const y = niceAxis(rows.flatMap((r) => [r.reading, r.leastSquares, ...r.zone, ...(r.target ?? [])]));
  return (
    <figure aria-label={label} style={{ margin: 0 }}>
      <ResponsiveContainer width="100%" height={height}>
        <ComposedChart data={rows} margin={{ top: 8, right: 16, bottom: 24, left: 8 }}>
          <CartesianGrid stroke={chartColors.grid} />
          <XAxis
            type="number"
            dataKey="position"
            domain={x.domain}
            ticks={x.ticks}
            tickFormatter={tickText}
            label={{ value: 'Station (mm)', position: 'insideBottom', offset: -12 }}
          />
          <YAxis
            type="number"
            domain={y.domain}
            ticks={y.ticks}
            tickFormatter={tickText}
            width={72}
            label={{ value: `Reading (${unitLabel})`, angle: -90, position: 'insideLeft', offset: 4 }}
          />
          <Tooltip
            formatter={(v) => (Array.isArray(v) ? v.map((n) => tickText(Number(n))).join(' to ') : tickText(Number(v)))}
            labelFormatter={(l) => `Station ${tickText(Number(l))} mm`}
          />
          <Legend verticalAlign="top" itemSorter={null} />
          {target && (
            <Area
              dataKey="target"
              name={target.label}
              stroke={chartColors.target}
              strokeOpacity={0.6}
              fill={chartColors.target}
              fillOpacity={0.1}
              strokeDasharray="3 3"
              isAnimationActive={false}
            />
          )}
          <Area
            dataKey="zone"
            name="Minimum zone"
            stroke={chartColors.band}
            fill={chartColors.band}
            fillOpacity={0.18}
            strokeDasharray="4 3"
            isAnimationActive={false}
          />
          <Line
            dataKey="leastSquares"
            name="Least-squares line"
            stroke={chartColors.fit}
            strokeDasharray="6 4"
            dot={false}
            isAnimationActive={false}
          />
          <Line
            dataKey="reading"
            name={`Reading (${unitLabel})`}
            stroke={chartColors.reading}
            strokeWidth={2}
            dot={{ r: 3 }}
            isAnimationActive={false}
          />
        </ComposedChart>
      </ResponsiveContainer>
    </figure>
  );
}
