/**
 * Test programs in plain G-code (RS-274 / ISO 6983 words only: G21, G90, G0, G1 with F, G4 P,
 * M0, M2; comments in parentheses). Coordinates in mm, absolute, three decimals.
 */

export interface ProgramHeader {
  title: string;
  machine: string;
  axis: string;
  letter: string;
  date: string;
  lines: string[];
}

export interface TravelProgramInput extends ProgramHeader {
  startMm: number;
  distancesMm: number[];
  overrunMm: number;
  feedMmPerMin: number;
}

export interface PositioningProgramInput extends ProgramHeader {
  targetsMm: number[];
  runs: number;
  overrunMm: number;
  feedMmPerMin: number;
  dwellS: number;
}

const n = (v: number) => v.toFixed(3);
// A comment may not hold parentheses of its own.
const comment = (text: string) => `(${text.replace(/[()]/g, '')})`;

const CAUTIONS = [
  'CAUTION: run this program with the plasma source or torch off, the spindle off and the laser off.',
  'Keep hands, tools and people clear of the gantry and its pinch points while it moves.',
  'Check the E-stop first, home the machine and try the program at a low feed override.',
  'G4 P is seconds on RS-274/NGC controls; some controls read P as milliseconds - check yours.',
];

function header(h: ProgramHeader): string[] {
  return [
    '%',
    comment(`Railwright test program: ${h.title}`),
    comment(`Machine: ${h.machine}`),
    comment(`Axis: ${h.axis} - moves the ${h.letter} word`),
    ...h.lines.map(comment),
    comment(`Written: ${h.date}`),
    ...CAUTIONS.map(comment),
    'G21 (millimetres)',
    'G90 (absolute coordinates)',
  ];
}

/**
 * Travel trial: take up the backlash by approaching the start from below, then each move goes
 * out from the start in the positive direction, stops for the measurement and comes back (from
 * below again, past the start by the overrun, so every measurement starts the same way).
 */
export function travelTrialProgram(p: TravelProgramInput): string {
  const L = p.letter;
  const F = Math.round(p.feedMmPerMin);
  const out = header(p);
  out.push(`G0 ${L}${n(p.startMm - p.overrunMm)}`, `G1 ${L}${n(p.startMm)} F${F}`, comment('Zero or mark the indicator, rule or tape at the start'), 'M0');
  p.distancesMm.forEach((d, i) => {
    out.push(comment(`Move ${i + 1} of ${p.distancesMm.length}: ${n(d)} mm`));
    out.push(`G1 ${L}${n(p.startMm + d)} F${F}`, comment(`Measure the move from the start and note it against ${n(d)} mm`), 'M0');
    out.push(`G1 ${L}${n(p.startMm - p.overrunMm)} F${F}`, `G1 ${L}${n(p.startMm)} F${F}`);
  });
  out.push('M2', '%');
  return out.join('\n') + '\n';
}

/**
 * Repeat-and-reverse run (the ISO 230-2 linear test cycle): each run up passes the targets in
 * ascending order, each run down in descending order, so every target is approached from its
 * side; the axis reverses beyond the last target by the overrun and comes back, so the first
 * target of each direction is approached the same way as the rest. A dwell at each target
 * leaves time for the reading.
 */
export function positioningProgram(p: PositioningProgramInput): string {
  const L = p.letter;
  const F = Math.round(p.feedMmPerMin);
  const targets = p.targetsMm;
  const low = targets[0] - p.overrunMm;
  const high = targets[targets.length - 1] + p.overrunMm;
  const out = header(p);
  out.push(`G0 ${L}${n(low)}`);
  for (let run = 1; run <= p.runs; run++) {
    out.push(comment(`Run ${run} up`));
    targets.forEach((t, i) => out.push(`G1 ${L}${n(t)} F${F}`, `G4 P${p.dwellS} ${comment(`read up ${run}, target ${i + 1}`)}`));
    out.push(`G1 ${L}${n(high)} F${F} ${comment('overrun, then reverse')}`);
    out.push(comment(`Run ${run} down`));
    for (let i = targets.length - 1; i >= 0; i--) out.push(`G1 ${L}${n(targets[i])} F${F}`, `G4 P${p.dwellS} ${comment(`read down ${run}, target ${i + 1}`)}`);
    out.push(`G1 ${L}${n(low)} F${F} ${comment('overrun, then reverse')}`);
  }
  out.push('M2', '%');
  return out.join('\n') + '\n';
}

/**
 * Default targets: at least five, about five per metre, spread over the travel with a small,
 * uneven offset from an even pitch so periodic errors (screw lead, pinion teeth) are not sampled
 * at the same phase every time (ISO 230-2 practice of P_i = (i − 1)p + r).
 */
export function defaultTargets(fromMm: number, toMm: number): number[] {
  const length = toMm - fromMm;
  const count = Math.min(21, Math.max(5, Math.ceil((length / 1000) * 5) + 1));
  const pitch = length / (count - 1);
  const out: number[] = [];
  for (let i = 0; i < count; i++) {
    const offset = i === 0 || i === count - 1 ? 0 : pitch * 0.1 * (((i * 0.618034) % 1) - 0.5);
    out.push(Math.round((fromMm + i * pitch + offset) * 10) / 10);
  }
  return out;
}
