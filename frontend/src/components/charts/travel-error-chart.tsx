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

export interface TravelErrorChartProps {
  /** Each move: commanded distance (mm) and its error measured − commanded in the display unit. */
  moves: { commanded: number; error: number }[];
  /** Fitted error line, error = slope · commanded + offset, in the display unit per mm. */
  fit?: { slope: number; offset: number };
  unitLabel: string;
  height?: number;
  /** Accessible name of the figure. */
  label?: string;
}

/** Error of each measured move against the commanded distance, with the fitted line. */
export function TravelErrorChart({
  moves,
  fit,
  unitLabel,
  height = 300,
  label = 'Travel error chart',
}: TravelErrorChartProps) {
  const rows = [...moves]
    .sort((a, b) => a.commanded - b.commanded)
    .map((m) => ({
      commanded: m.commanded,
      error: m.error,
      fit: fit ? fit.slope * m.commanded + fit.offset : undefined,
    }));
  // Draw the fitted line from zero so a pure scale error reads as a line through the origin.
  const lineRows =
    fit && rows.length
      ? [{ commanded: 0, fit: fit.offset }, ...rows.map((r) => ({ commanded: r.commanded, fit: r.fit }))]
      : [];
  const x = niceAxis([0, ...rows.map((r) => r.commanded)]);
  const y = niceAxis([...rows.map((r) => r.error), ...lineRows.map((r) => r.fit ?? NaN)]);
  const fmt = tickText;
  return (
    <figure aria-label={label} style={{ margin: 0 }}>
      <ResponsiveContainer width="100%" height={height}>
        <ComposedChart margin={{ top: 8, right: 16, bottom: 24, left: 8 }}>
          <CartesianGrid stroke={chartColors.grid} />
          <XAxis
            type="number"
            dataKey="commanded"
            domain={x.domain}
            ticks={x.ticks}
            tickFormatter={fmt}
            label={{ value: 'Commanded (mm)', position: 'insideBottom', offset: -12 }}
          />
          <YAxis
            type="number"
            domain={y.domain}
            ticks={y.ticks}
            tickFormatter={fmt}
            width={72}
            label={{ value: `Error (${unitLabel})`, angle: -90, position: 'insideLeft', offset: 4 }}
          />
          <Tooltip formatter={(v) => fmt(Number(v))} labelFormatter={(l) => `${fmt(Number(l))} mm commanded`} />
          <Legend verticalAlign="top" itemSorter={null} />
          {fit && (
            <Line
              data={lineRows}
              dataKey="fit"
              name="Fitted line"
              stroke={chartColors.fit}
              strokeDasharray="6 4"
              dot={false}
              isAnimationActive={false}
            />
          )}
          <Scatter
            data={rows}
            dataKey="error"
            name={`Measured − commanded (${unitLabel})`}
            fill={chartColors.reading}
            isAnimationActive={false}
          />
        </ComposedChart>
      </ResponsiveContainer>
    </figure>
  );
}
