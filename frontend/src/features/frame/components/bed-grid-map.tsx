import { Box, Typography } from '@mui/material';
import { fromMm, UNIT_LABELS, type LengthUnit } from '../../../lib/units';
import type { GridPointResult } from '../types';
import { residualColour, textOn, PALETTE_STOPS } from '../utils/residual-palette';
import { residualOf } from '../utils/grid-labels';

export interface BedGridMapProps {
  points: GridPointResult[];
  /** Unit of the heights (the grid's readingUnit). */
  unit: LengthUnit;
  /** Unit of the positions (the grid's lengthUnit); mm when absent. */
  lengthUnit?: LengthUnit;
  /** The value drawn per point, mm; the least-squares residual when absent. */
  valueOf?: (p: GridPointResult) => number;
  /** What the values are measured from, e.g. "the middle of the height range". */
  reference?: string;
  /** Outlined: the point furthest from the reference. */
  worstIndex?: number;
}

const DIGITS: Record<LengthUnit, number> = { mm: 2, um: 0, in: 4, thou: 1 };

/**
 * Heights about a reference (the middle of the judged zone, or the least-squares plane) as a plan
 * of the bed (Y0, the front, at the bottom), coloured on a scale symmetric about zero so equal highs
 * and lows read as equally strong.
 */
export function BedGridMap({
  points,
  unit,
  lengthUnit = 'mm',
  valueOf = (p) => p.residualMm,
  reference = 'the fitted plane',
  worstIndex,
}: BedGridMapProps) {
  const pos = (mm: number) => Number(fromMm(mm, lengthUnit).toFixed(lengthUnit === 'in' ? 2 : 0));
  const lu = UNIT_LABELS[lengthUnit];
  const xs = [...new Set(points.map((p) => p.xMm))].sort((a, b) => a - b);
  const ys = [...new Set(points.map((p) => p.yMm))].sort((a, b) => a - b);
  const range = Math.max(...points.map((p) => Math.abs(valueOf(p))), 1e-9);
  const cw = Math.min(108, 620 / xs.length);
  const ch = Math.min(64, 340 / ys.length);
  const left = 96;
  const top = 12;
  const gridW = cw * xs.length;
  const gridH = ch * ys.length;
  const legendY = top + gridH + 50;
  const W = Math.max(left + gridW + 16, 460);
  const H = legendY + 56;
  const u = UNIT_LABELS[unit];
  const show = (mm: number) => residualOf(mm, unit, DIGITS[unit]);

  return (
    <Box>
      <Box
        component="svg"
        viewBox={`0 0 ${W} ${H}`}
        role="img"
        aria-label={`Bed grid colour map of heights in ${u} from ${reference}, ${ys.length} rows by ${xs.length} columns`}
        sx={{ width: '100%', maxWidth: W * 1.25, display: 'block', fontFamily: 'Roboto, sans-serif' }}
      >
        <defs>
          <linearGradient id="residual-scale" x1="0" x2="1" y1="0" y2="0">
            {PALETTE_STOPS.map((t) => (
              <stop key={t} offset={`${((t + 1) / 2) * 100}%`} stopColor={residualColour(t)} />
            ))}
          </linearGradient>
        </defs>
        {points.map((p) => {
          const x = left + xs.indexOf(p.xMm) * cw;
          const y = top + (ys.length - 1 - ys.indexOf(p.yMm)) * ch;
          const t = valueOf(p) / range;
          const worst = p.index === worstIndex;
          return (
            <g key={p.index}>
              <title>{`row ${p.row}, column ${p.column} (X ${pos(p.xMm)} ${lu}, Y ${pos(p.yMm)} ${lu}): ${show(valueOf(p))} from ${reference}`}</title>
              <rect
                x={x + 1}
                y={y + 1}
                width={cw - 2}
                height={ch - 2}
                rx={3}
                fill={residualColour(t)}
                stroke={worst ? '#1e2624' : 'none'}
                strokeWidth={worst ? 2.5 : 0}
              />
              <text
                x={x + cw / 2}
                y={y + ch / 2 + 5}
                textAnchor="middle"
                fontSize={Math.min(14, cw / 5.5)}
                fontWeight={worst ? 700 : 500}
                fill={textOn(t)}
              >
                {show(valueOf(p)).replace(` ${u}`, '')}
              </text>
            </g>
          );
        })}
        {xs.map((x, i) => (
          <text
            key={`x${x}`}
            x={left + i * cw + cw / 2}
            y={top + gridH + 18}
            textAnchor="middle"
            fontSize={12}
            fill="#4d5855"
          >
            {`col ${i + 1} · X ${pos(x)}`}
          </text>
        ))}
        {ys.map((y, i) => (
          <text
            key={`y${y}`}
            x={left - 8}
            y={top + (ys.length - 1 - i) * ch + ch / 2 + 4}
            textAnchor="end"
            fontSize={12}
            fill="#4d5855"
          >
            {`row ${i + 1} · Y ${pos(y)}`}
          </text>
        ))}
        <text x={left + gridW / 2} y={top + gridH + 34} textAnchor="middle" fontSize={11.5} fill="#4d5855">
          positions in {lu} · cells in {u} from {reference}
        </text>
        <g aria-label="Legend">
          <rect
            x={left}
            y={legendY}
            width={Math.min(gridW, 320)}
            height={14}
            rx={2}
            fill="url(#residual-scale)"
            stroke="#cfc9bb"
          />
          <text
            x={left}
            y={legendY + 32}
            fontSize={12}
            fill="#1e2624"
          >{`−${fromMm(range, unit).toFixed(DIGITS[unit])} ${u} low`}</text>
          <text x={left + Math.min(gridW, 320) / 2} y={legendY + 32} fontSize={12} textAnchor="middle" fill="#1e2624">
            0 (the reference)
          </text>
          <text
            x={left + Math.min(gridW, 320)}
            y={legendY + 32}
            fontSize={12}
            textAnchor="end"
            fill="#1e2624"
          >{`high +${fromMm(range, unit).toFixed(DIGITS[unit])} ${u}`}</text>
        </g>
      </Box>
      <Typography variant="body2" color="text.secondary">
        Plan view from the front of the machine: row 1 (Y0) at the bottom, column 1 (X0) on the left. Teal is below the
        reference, brass and rust above.
      </Typography>
    </Box>
  );
}
