import { CartesianGrid, Legend, Line, LineChart, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import { chartColors } from './chart-colors';

export interface OverlaySeries {
  name: string;
  /** Station (mm) and value in the display unit. */
  points: { position: number; value: number }[];
}

const COLORS = [chartColors.reading, chartColors.down, chartColors.band, chartColors.fit];

/** Several sweeps of one rail on one chart, to see what an adjustment changed. */
export function SweepOverlayChart({ series, unitLabel, yLabel, height = 300, label = 'Sweeps overlaid' }: { series: OverlaySeries[]; unitLabel: string; yLabel: string; height?: number; label?: string }) {
  const fmt = (v: number) => Number(Number(v).toPrecision(4)).toString();
  return (
    <figure aria-label={label} style={{ margin: 0 }}>
      <ResponsiveContainer width="100%" height={height}>
        <LineChart margin={{ top: 8, right: 16, bottom: 24, left: 8 }}>
          <CartesianGrid stroke={chartColors.grid} />
          <XAxis type="number" dataKey="position" domain={['dataMin', 'dataMax']} tickFormatter={fmt} allowDuplicatedCategory={false} label={{ value: 'Station (mm)', position: 'insideBottom', offset: -12 }} />
          <YAxis tickFormatter={fmt} width={72} label={{ value: `${yLabel} (${unitLabel})`, angle: -90, position: 'insideLeft', offset: 4 }} />
          <Tooltip formatter={(v) => `${fmt(Number(v))} ${unitLabel}`} labelFormatter={(l) => `Station ${fmt(Number(l))} mm`} />
          <Legend verticalAlign="top" height={28} />
          {series.map((s, i) => (
            <Line key={s.name} data={s.points} dataKey="value" name={s.name} stroke={COLORS[i % COLORS.length]} strokeWidth={2} strokeDasharray={i ? '6 3' : undefined} dot={{ r: 3 }} isAnimationActive={false} />
          ))}
        </LineChart>
      </ResponsiveContainer>
    </figure>
  );
}
