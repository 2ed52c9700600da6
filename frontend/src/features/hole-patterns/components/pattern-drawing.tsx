import { Box } from '@mui/material';
import type { HoleMm, PatternReference } from '../types';

interface Props {
  widthMm: number;
  heightMm: number;
  holes: HoleMm[];
  reference: PatternReference;
  /** Accessible name of the drawing. */
  label: string;
  maxHeight?: number;
}

/** Reference edges as [x1, y1, x2, y2] in pattern mm (y up). */
function referenceEdges(ref: PatternReference, w: number, h: number): [number, number, number, number][] {
  const left: [number, number, number, number] = [0, 0, 0, h];
  const right: [number, number, number, number] = [w, 0, w, h];
  const bottom: [number, number, number, number] = [0, 0, w, 0];
  const top: [number, number, number, number] = [0, h, w, h];
  const byName = {
    left: [left],
    right: [right],
    bottom: [bottom],
    top: [top],
    'bottom-left': [left, bottom],
    'bottom-right': [right, bottom],
    'top-left': [left, top],
    'top-right': [right, top],
  };
  return byName[ref];
}

/**
 * The pattern drawn to fit its box (not to scale — the PDF is the true-scale template): outline,
 * reference edge in the accent colour, each hole with its crosshair.
 */
export function PatternDrawing({ widthMm, heightMm, holes, reference, label, maxHeight = 320 }: Props) {
  const pad = Math.max(widthMm, heightMm) * 0.06;
  const stroke = Math.max(widthMm, heightMm) / 400;
  const Y = (y: number) => heightMm - y;
  return (
    <Box sx={{ width: '100%', maxHeight, display: 'flex', justifyContent: 'center' }}>
      <svg
        role="img"
        aria-label={label}
        viewBox={`${-pad} ${-pad} ${widthMm + 2 * pad} ${heightMm + 2 * pad}`}
        style={{ width: '100%', maxHeight, display: 'block' }}
        preserveAspectRatio="xMidYMid meet"
      >
        <rect x={0} y={0} width={widthMm} height={heightMm} fill="#f6f4ef" stroke="#4d5855" strokeWidth={stroke} />
        {referenceEdges(reference, widthMm, heightMm).map(([x1, y1, x2, y2], i) => (
          <line key={i} x1={x1} y1={Y(y1)} x2={x2} y2={Y(y2)} stroke="#1d4f4a" strokeWidth={stroke * 4} />
        ))}
        {holes.map((h, i) => {
          const r = h.diameterMm / 2;
          const arm = r + Math.max(widthMm, heightMm) / 80;
          return (
            <g key={i}>
              <circle cx={h.xMm} cy={Y(h.yMm)} r={r} fill="#fff" stroke="#1e2624" strokeWidth={stroke} />
              <path
                d={`M ${h.xMm - arm} ${Y(h.yMm)} H ${h.xMm + arm} M ${h.xMm} ${Y(h.yMm) - arm} V ${Y(h.yMm) + arm}`}
                stroke="#1e2624"
                strokeWidth={stroke * 0.6}
              />
            </g>
          );
        })}
      </svg>
    </Box>
  );
}
