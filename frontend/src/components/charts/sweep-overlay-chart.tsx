import { CartesianGrid, Legend, Line, LineChart, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import { chartColors } from './chart-colors';
import { niceAxis, tickText } from './nice-axis';
import { bandAround, targetBandArea, type TargetBand } from './target-band';

export interface OverlaySeries {
  name: string;
  /** Station (mm) and value in the display unit. */
  points: { position: number; value: number }[];
}

const COLORS = [chartColors.reading, chartColors.down, chartColors.band, chartColors.fit];

/** Several sweeps of one rail (or a partner pair's differences) on one chart, with the target zone. */
export function SweepOverlayChart({
  series,
  unitLabel,
  yLabel,
  target,
  height = 300,
  label = 'Sweeps overlaid',
}: {
  series: OverlaySeries[];
  unitLabel: string;
  yLabel: string;
  target?: TargetBand | null;
  height?: number;
  label?: string;
}) {
  const values = series.flatMap((s) => s.points.map((p) => p.value));
  const band = target ? bandAround(values, target.width) : null;
  const x = niceAxis(series.flatMap((s) => s.points.map((p) => p.position)));
  const y = niceAxis([...values, ...(band ?? [])]);
  return (
    <figure aria-label={label} style={{ margin: 0 }}>
      <ResponsiveContainer width="100%" height={height}>
        <LineChart margin={{ top: 8, right: 16, bottom: 24, left: 8 }}>
          <CartesianGrid stroke={chartColors.grid} />
          <XAxis
            type="number"
            dataKey="position"
            domain={x.domain}
            ticks={x.ticks}
            tickFormatter={tickText}
            allowDuplicatedCategory={false}
            label={{ value: 'Station (mm)', position: 'insideBottom', offset: -12 }}
          />
          <YAxis
            type="number"
            domain={y.domain}
            ticks={y.ticks}
            tickFormatter={tickText}
            width={72}
            label={{ value: `${yLabel} (${unitLabel})`, angle: -90, position: 'insideLeft', offset: 4 }}
          />
          <Tooltip
            formatter={(v) => `${tickText(Number(v))} ${unitLabel}`}
            labelFormatter={(l) => `Station ${tickText(Number(l))} mm`}
          />
          <Legend verticalAlign="top" />
          {band && target && targetBandArea(band, target.label)}
          {series.map((s, i) => (
            <Line
              key={s.name}
              data={s.points}
              dataKey="value"
              name={s.name}
              stroke={COLORS[i % COLORS.length]}
              strokeWidth={2}
              strokeDasharray={i ? '6 3' : undefined}
              dot={{ r: 3 }}
              isAnimationActive={false}
            />
          ))}
        </LineChart>
      </ResponsiveContainer>
    </figure>
  );
}
