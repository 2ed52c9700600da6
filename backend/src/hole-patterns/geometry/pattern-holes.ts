/**
 * Hole centres of a drilling pattern, in mm, from the outline's lower-left corner (x to the
 * right, y upwards). Plain geometry, no framework: the service and the template both use it.
 */

export interface Hole {
  xMm: number;
  yMm: number;
  diameterMm: number;
}

export interface GridInput {
  /** Centre of the first hole (lowest row, leftmost column). */
  originXMm: number;
  originYMm: number;
  rows: number;
  columns: number;
  /** Centre distance between columns (along x) and between rows (along y). */
  pitchXMm: number;
  pitchYMm: number;
  diameterMm: number;
}

export interface BoltCircleInput {
  centreXMm: number;
  centreYMm: number;
  /** Diameter of the circle the hole centres lie on (pitch circle diameter). */
  circleDiameterMm: number;
  count: number;
  /** Angle of the first hole from the +x direction, anticlockwise, degrees. */
  startAngleDeg: number;
  diameterMm: number;
}

/** Row by row from the lowest, each row left to right; index k·pitch rather than accumulating. */
export function gridHoles(g: GridInput): Hole[] {
  const holes: Hole[] = [];
  for (let r = 0; r < g.rows; r++) {
    for (let c = 0; c < g.columns; c++) {
      holes.push({ xMm: g.originXMm + c * g.pitchXMm, yMm: g.originYMm + r * g.pitchYMm, diameterMm: g.diameterMm });
    }
  }
  return holes;
}

/** Holes equally spaced on a circle, the first at the start angle, going anticlockwise. */
export function boltCircleHoles(c: BoltCircleInput): Hole[] {
  const radius = c.circleDiameterMm / 2;
  return Array.from({ length: c.count }, (_, k) => {
    const angle = ((c.startAngleDeg + (360 * k) / c.count) * Math.PI) / 180;
    return {
      xMm: c.centreXMm + radius * Math.cos(angle),
      yMm: c.centreYMm + radius * Math.sin(angle),
      diameterMm: c.diameterMm,
    };
  });
}

// Binary slack so a hole drawn exactly to the edge, or two holes exactly touching, are accepted.
const SLACK_MM = 1e-9;

const fmt = (mm: number) => `${Number(mm.toFixed(3))} mm`;

/**
 * What is wrong with the holes for this outline: each message names the field (through
 * `field(i)`) and the hole. Empty when every hole lies wholly inside, has a positive diameter and
 * overlaps no other. Touching holes are allowed (a web of zero width is the person's call).
 */
export function patternProblems(
  widthMm: number,
  heightMm: number,
  holes: readonly Hole[],
  field: (index: number) => string,
  max = 20,
): string[] {
  const problems: string[] = [];
  holes.forEach((h, i) => {
    const where = `hole ${i + 1} at (${fmt(h.xMm)}, ${fmt(h.yMm)})`;
    if (!(h.diameterMm > 0)) {
      problems.push(`${field(i)}: ${where} needs a diameter greater than 0`);
      return;
    }
    const r = h.diameterMm / 2;
    if (
      h.xMm - r < -SLACK_MM ||
      h.xMm + r > widthMm + SLACK_MM ||
      h.yMm - r < -SLACK_MM ||
      h.yMm + r > heightMm + SLACK_MM
    ) {
      problems.push(
        `${field(i)}: ${where}, Ø ${fmt(h.diameterMm)}, must lie wholly inside the ${fmt(widthMm)} × ${fmt(heightMm)} outline`,
      );
    }
  });
  // Sweep along x: only holes whose x ranges meet can overlap.
  const order = holes
    .map((_, i) => i)
    .filter((i) => holes[i].diameterMm > 0)
    .sort((a, b) => holes[a].xMm - holes[b].xMm);
  const maxRadius = Math.max(0, ...order.map((i) => holes[i].diameterMm / 2));
  for (let a = 0; a < order.length && problems.length < max; a++) {
    const p = holes[order[a]];
    for (let b = a + 1; b < order.length; b++) {
      const q = holes[order[b]];
      if (q.xMm - p.xMm > p.diameterMm / 2 + maxRadius) break;
      const reach = p.diameterMm / 2 + q.diameterMm / 2;
      if (Math.hypot(q.xMm - p.xMm, q.yMm - p.yMm) < reach - SLACK_MM) {
        const [first, second] = [order[a], order[b]].sort((x, y) => x - y);
        problems.push(
          `${field(second)}: hole ${second + 1} overlaps hole ${first + 1} (centres ${fmt(Math.hypot(q.xMm - p.xMm, q.yMm - p.yMm))} apart, radii add up to ${fmt(reach)})`,
        );
        if (problems.length >= max) break;
      }
    }
  }
  return problems.slice(0, max);
}
