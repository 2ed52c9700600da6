import { Box, Typography } from '@mui/material';
import { palette } from '../../../theme/theme';
import { UNIT_LABELS, fromMm, type LengthUnit } from '../../../lib/units';
import { exaggerationFor } from '../utils/exaggeration';

export interface SquarenessDrawingProps {
  sideXMm: number;
  sideYMm: number;
  diagonal1Mm: number;
  diagonal2Mm: number;
  outOfSquareRad: number;
  longDiagonal: 1 | 2;
  correction: { moveMm: number; end: 'x-far' | 'x0' | null };
  unit: LengthUnit;
}

const W = 640;
const MAX_H = 430;
const RUST = '#a4522f';

type P = [number, number];

/**
 * The measured rectangle as a parallelogram, its lean exaggerated by a round factor so it can be
 * seen, with both diagonals and the move that squares it. Y0 is at the bottom, as seen from the
 * front of the machine; the dashed outline is the square rectangle the marks should have made.
 */
export function SquarenessDrawing(p: SquarenessDrawingProps) {
  const factor = exaggerationFor(p.outOfSquareRad);
  // The correction's label needs room on the side of the end that moves.
  const leftArrow = p.correction.end === 'x0';
  const M = { l: leftArrow ? 182 : 92, r: leftArrow ? 92 : 182, t: 34, b: 62 };
  const sign = p.outOfSquareRad === 0 ? 0 : p.longDiagonal === 1 ? 1 : -1;
  // The X direction (the gantry) turned by φ; with diagonal 1 long the X-far end runs ahead.
  const phi = Math.min(sign * p.outOfSquareRad * factor, 0.35);
  const a = p.sideXMm;
  const b = p.sideYMm;
  const A: P = [0, 0];
  const B: P = [a * Math.cos(phi), a * Math.sin(phi)];
  const D: P = [0, b];
  const C: P = [B[0] + D[0], B[1] + D[1]];
  const xs = [A, B, C, D, [a, 0], [a, b]].map((q) => q[0]);
  const ys = [A, B, C, D, [a, 0], [a, b]].map((q) => q[1]);
  const minX = Math.min(...xs);
  const minY = Math.min(...ys);
  const s = Math.min((W - M.l - M.r) / (Math.max(...xs) - minX), (MAX_H - M.t - M.b) / (Math.max(...ys) - minY));
  // As tall as the figure needs, so a wide rectangle leaves no empty band above it.
  const figureH = Math.ceil(M.t + (Math.max(...ys) - minY) * s + M.b);
  const H = figureH + 48;
  const at = ([x, y]: P): P => [M.l + (x - minX) * s, figureH - M.b - (y - minY) * s];
  const [a2, b2, c2, d2] = [at(A), at(B), at(C), at(D)];
  const ideal = [at([0, 0]), at([a, 0]), at([a, b]), at([0, b])];
  const poly = (pts: P[]) => pts.map((q) => q.join(',')).join(' ');
  const u = UNIT_LABELS[p.unit];
  const len = (mm: number) => `${fromMm(mm, p.unit).toFixed(p.unit === 'in' ? 3 : 2)} ${u}`;
  const along = (from: P, to: P, f: number): P => [from[0] + (to[0] - from[0]) * f, from[1] + (to[1] - from[1]) * f];
  const d1Long = p.longDiagonal === 1 && sign !== 0;
  const d2Long = p.longDiagonal === 2 && sign !== 0;
  // Numbered tags near each diagonal's starting corner, the lengths in a key below the figure,
  // so nothing is written across the crossing.
  const l1 = along(a2, c2, 0.14);
  const l2 = along(b2, d2, 0.14);

  // The arrow sits beside the end of the gantry that runs ahead and points back towards Y0.
  const end = p.correction.end;
  const sideTop = end === 'x-far' ? c2 : d2;
  const sideBottom = end === 'x-far' ? b2 : a2;
  const mid = along(sideBottom, sideTop, 0.5);
  const ax = end === 'x-far' ? mid[0] + 26 : mid[0] - 26;
  const halo = { paintOrder: 'stroke' as const, stroke: '#ffffff', strokeWidth: 4, strokeLinejoin: 'round' as const };
  const label = `Measured rectangle, lean exaggerated ${factor} times: diagonal 1 ${len(p.diagonal1Mm)}, diagonal 2 ${len(p.diagonal2Mm)}${end ? `; move the ${end === 'x-far' ? 'X-far' : 'X0'} end ${p.correction.moveMm.toFixed(2)} mm towards Y0` : ''}`;

  return (
    <Box>
      <Box
        component="svg"
        viewBox={`0 0 ${W} ${H}`}
        role="img"
        aria-label={label}
        sx={{ width: '100%', maxWidth: 720, display: 'block', fontFamily: 'Roboto, sans-serif' }}
      >
        <defs>
          <marker
            id="sq-arrow"
            viewBox="0 0 10 10"
            refX="8"
            refY="5"
            markerWidth="7"
            markerHeight="7"
            orient="auto-start-reverse"
          >
            <path d="M0,0 L10,5 L0,10 z" fill={palette.brass} />
          </marker>
        </defs>
        <polygon points={poly(ideal)} fill="none" stroke="#b9b3a4" strokeDasharray="6 5" strokeWidth={1.5} />
        <polygon points={poly([a2, b2, c2, d2])} fill="rgba(29, 79, 74, 0.05)" stroke={palette.ink} strokeWidth={2.2} />
        <line
          x1={a2[0]}
          y1={a2[1]}
          x2={c2[0]}
          y2={c2[1]}
          stroke={d1Long ? RUST : palette.steelLight}
          strokeWidth={d1Long ? 3 : 2}
        />
        <line
          x1={b2[0]}
          y1={b2[1]}
          x2={d2[0]}
          y2={d2[1]}
          stroke={d2Long ? RUST : palette.steelLight}
          strokeWidth={d2Long ? 3 : 2}
        />
        {[
          [l1, '1', d1Long],
          [l2, '2', d2Long],
        ].map(([pt, n, long]) => (
          <g key={n as string}>
            <circle
              cx={(pt as P)[0]}
              cy={(pt as P)[1]}
              r={10}
              fill="#ffffff"
              stroke={long ? RUST : palette.steelLight}
              strokeWidth={2}
            />
            <text
              x={(pt as P)[0]}
              y={(pt as P)[1] + 4.5}
              fontSize={12.5}
              fontWeight={700}
              textAnchor="middle"
              fill={long ? RUST : palette.steel}
            >
              {n as string}
            </text>
          </g>
        ))}
        {[
          [1, p.diagonal1Mm, d1Long, 'X0 Y0 corner to the far corner'],
          [2, p.diagonal2Mm, d2Long, 'X-far Y0 corner to X0 Y-far corner'],
        ].map(([n, mm, long, path], i) => (
          <g key={n as number}>
            <line
              x1={M.l}
              x2={M.l + 28}
              y1={figureH + 8 + i * 20}
              y2={figureH + 8 + i * 20}
              stroke={long ? RUST : palette.steelLight}
              strokeWidth={long ? 3 : 2}
            />
            <text
              x={M.l + 36}
              y={figureH + 12.5 + i * 20}
              fontSize={13}
              fill={long ? RUST : palette.ink}
              fontWeight={long ? 700 : 400}
            >
              {`Diagonal ${n} · ${len(mm as number)}${long ? ' (long)' : ''} · ${path as string}`}
            </text>
          </g>
        ))}
        <text
          x={(a2[0] + b2[0]) / 2}
          y={Math.max(a2[1], b2[1]) + 24}
          fontSize={13}
          textAnchor="middle"
          fill={palette.ink}
        >
          X side {len(a)}
        </text>
        {(() => {
          const x = leftArrow ? Math.max(b2[0], c2[0]) + 16 : a2[0] - 14;
          const y = leftArrow ? (b2[1] + c2[1]) / 2 : (a2[1] + d2[1]) / 2;
          return (
            <text
              x={x}
              y={y}
              fontSize={13}
              textAnchor="middle"
              fill={palette.ink}
              transform={`rotate(${leftArrow ? 90 : -90} ${x} ${y})`}
            >
              Y side {len(b)}
            </text>
          );
        })()}
        <text x={a2[0]} y={a2[1] + 44} fontSize={12} fill="#4d5855">
          X0 Y0 corner
        </text>
        {end && p.correction.moveMm > 0 && (
          <g>
            <line
              x1={ax}
              y1={mid[1] - 34}
              x2={ax}
              y2={mid[1] + 34}
              stroke={palette.brass}
              strokeWidth={3.5}
              markerEnd="url(#sq-arrow)"
            />
            <text
              x={end === 'x-far' ? ax + 12 : ax - 12}
              y={mid[1] - 6}
              fontSize={14}
              fontWeight={700}
              textAnchor={end === 'x-far' ? 'start' : 'end'}
              fill={palette.ink}
              style={halo}
            >
              Move {p.correction.moveMm.toFixed(2)} mm
            </text>
            <text
              x={end === 'x-far' ? ax + 12 : ax - 12}
              y={mid[1] + 12}
              fontSize={12.5}
              textAnchor={end === 'x-far' ? 'start' : 'end'}
              fill="#4d5855"
              style={halo}
            >
              {end === 'x-far' ? 'X-far' : 'X0'} end, towards Y0
            </text>
          </g>
        )}
      </Box>
      <Typography variant="body2" color="text.secondary">
        {factor > 1
          ? `Lean exaggerated ×${factor} so it can be seen; lengths are as measured.`
          : 'Drawn to scale; lengths are as measured.'}{' '}
        The dashed outline is the square rectangle; Y0 is at the bottom.
      </Typography>
    </Box>
  );
}
