import gcode from 'gcode-parser';

/**
 * Reads a test program back with an independent RS-274 reader (npm gcode-parser) and simulates
 * it the way a control would: modal groups as RS-274/NGC defines them (plane G17–G19, units
 * G20/G21, distance G90/G91, feed mode G93–G95, cutter compensation G40–G42, motion G0/G1/G80),
 * positions in mm whatever the units, and where each optional stop (M1) happens.
 */
export interface SimulatedMove {
  line: number;
  code: 'G0' | 'G1';
  fromMm: number | null;
  toMm: number;
  /** Feed in mm/min for G1 (null for G0). */
  feedMmPerMin: number | null;
}

export interface ProgramRun {
  blocks: { line: string; words: string[]; comments: string[] }[];
  /** Index of the block holding G17 (the safety line), -1 when none. */
  safetyAt: number;
  /** Index of the first block with a motion word or an axis word, -1 when none. */
  firstMotionAt: number;
  /** Modal state right after the safety line. */
  modalAfterSafety: Record<string, string>;
  moves: SimulatedMove[];
  /** Where the axis stood at each M1, mm, and the direction of the move that arrived there. */
  stops: { atMm: number; approach: 'up' | 'down' | null }[];
  codes: Set<string>;
  /** Blocks holding two words of one modal group, which RS-274/NGC refuses. */
  groupClashes: string[];
}

const GROUP: Record<string, string> = {
  G17: 'plane',
  G18: 'plane',
  G19: 'plane',
  G20: 'units',
  G21: 'units',
  G90: 'distance',
  G91: 'distance',
  G93: 'feedMode',
  G94: 'feedMode',
  G95: 'feedMode',
  G40: 'cutterComp',
  G41: 'cutterComp',
  G42: 'cutterComp',
  G0: 'motion',
  G1: 'motion',
  G2: 'motion',
  G3: 'motion',
  G80: 'motion',
};

const word = ([letter, value]: [string, number]) => `${letter}${value}`;

export function readProgram(text: string, letter: string): ProgramRun {
  const parsed = gcode.parseStringSync(text);
  const blocks = parsed.map((p) => ({ line: p.line, words: p.words.map(word), comments: p.comments ?? [] }));
  const modal: Record<string, string> = {};
  let modalAfterSafety: Record<string, string> = {};
  let safetyAt = -1;
  let firstMotionAt = -1;
  let pos: number | null = null;
  let feed: number | null = null;
  let lastDir: 'up' | 'down' | null = null;
  const moves: SimulatedMove[] = [];
  const stops: ProgramRun['stops'] = [];
  const codes = new Set<string>();
  const groupClashes: string[] = [];
  const toMm = (v: number) => (modal.units === 'G20' ? v * 25.4 : v);

  parsed.forEach((p, i) => {
    const gm = p.words.filter(([l]) => l === 'G' || l === 'M').map(word);
    gm.forEach((c) => codes.add(c));
    const groups = gm.filter((c) => GROUP[c]).map((c) => GROUP[c]);
    if (new Set(groups).size !== groups.length) groupClashes.push(p.line);
    for (const c of gm) if (GROUP[c]) modal[GROUP[c]] = c;
    const f = p.words.find(([l]) => l === 'F');
    if (f) feed = toMm(f[1]);
    const axisWord = p.words.find(([l]) => l === letter);
    const motion = gm.some((c) => c === 'G0' || c === 'G1');
    if ((motion || axisWord) && firstMotionAt < 0) firstMotionAt = i;
    if (gm.includes('G17') && safetyAt < 0) {
      safetyAt = i;
      modalAfterSafety = { ...modal };
    }
    if (axisWord) {
      const code = modal.motion as 'G0' | 'G1';
      const to = toMm(axisWord[1]);
      if (pos !== null && to !== pos) lastDir = to > pos ? 'up' : 'down';
      moves.push({ line: i, code, fromMm: pos, toMm: to, feedMmPerMin: code === 'G1' ? feed : null });
      pos = to;
    }
    if (gm.includes('M1')) stops.push({ atMm: pos!, approach: lastDir });
  });
  return { blocks, safetyAt, firstMotionAt, modalAfterSafety, moves, stops, codes, groupClashes };
}
