import { ReferenceArea } from 'recharts';
import { chartColors } from './chart-colors';

export interface TargetBand {
  /** Full width of the tolerance zone, in the chart's unit. */
  width: number;
  /** What the label says, e.g. "Target 0.05 mm wide". */
  label: string;
}

/** Lower and upper edge of a band `width` wide centred midway between the values' extremes. */
export function bandAround(values: readonly number[], width: number): [number, number] {
  const finite = values.filter((v) => Number.isFinite(v));
  const centre = finite.length ? (Math.min(...finite) + Math.max(...finite)) / 2 : 0;
  return [centre - width / 2, centre + width / 2];
}

/**
 * The tolerance zone as a shaded horizontal band. Centred on the middle of the values, so
 * every value lies inside it exactly when their spread (the judged result) is within target.
 * Called as a function, not a component: the chart must see the ReferenceArea itself.
 */
export function targetBandArea(edges: [number, number], label: string) {
  return (
    <ReferenceArea
      y1={edges[0]}
      y2={edges[1]}
      fill={chartColors.target}
      fillOpacity={0.12}
      stroke={chartColors.target}
      strokeDasharray="3 3"
      strokeOpacity={0.6}
      ifOverflow="extendDomain"
      label={{ value: label, position: 'insideTopRight', fill: chartColors.target, fontSize: 12 }}
    />
  );
}
