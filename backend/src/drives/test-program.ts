/**
 * Test programs in plain G-code (RS-274 / ISO 6983 words only: G17, G20 or G21, G90, G94, G40,
 * G80, G0, G1 with F, G4 P, M1, M2; comments in parentheses). Coordinates absolute, in the unit
 * the axis is set up in: millimetres with three decimals, or inches with four.
 */

/** The unit a program is written in: G21 millimetres or G20 inches. */
export type ProgramUnit = 'mm' | 'in';

export interface ProgramHeader {
  title: string;
  machine: string;
  axis: string;
  letter: string;
  date: string;
  unit: ProgramUnit;
  /** Where the program moves, mm: the work zero and the range are explained in the header. */
  lowestMm: number;
  highestMm: number;
  lines: string[];
}

export interface TravelProgramInput extends ProgramHeader {
  startMm: number;
  distancesMm: number[];
  overrunMm: number;
  feedMmPerMin: number;
  dwellS: number;
}

export interface PositioningProgramInput extends ProgramHeader {
  targetsMm: number[];
  runs: number;
  overrunMm: number;
  feedMmPerMin: number;
  dwellS: number;
}

/**
 * Text from people (machine and axis names, notes) reduced to what cannot end a comment, start
 * a word or a new block on any control: letters, digits, spaces and . , : + - / = _ — no line
 * breaks, no parentheses or brackets, no ; (comment to end of line), no % (tape mark), no * or #.
 * Accents are dropped to the base letter (é → e) because many controls read ASCII only.
 */
export function programText(text: string, max = 200): string {
  return text
    .normalize('NFKD')
    .replace(/[^A-Za-z0-9 .,:+\-/=_]/g, ' ')
    .replace(/\s+/g, ' ')
    .trim()
    .slice(0, max)
    .trim();
}

const comment = (text: string) => `(${programText(text)})`;

/** A coordinate or feed in the program's unit. */
export const inUnit = (mm: number, unit: ProgramUnit) => (unit === 'in' ? (mm * 10) / 254 : mm);
const coord = (mm: number, unit: ProgramUnit) => inUnit(mm, unit).toFixed(unit === 'in' ? 4 : 3);
const feed = (mmPerMin: number, unit: ProgramUnit) =>
  unit === 'in' ? String(Math.round(inUnit(mmPerMin, unit) * 10) / 10) : String(Math.round(mmPerMin));
const unitWord = (unit: ProgramUnit) => (unit === 'in' ? 'in' : 'mm');

/**
 * Plane XY, units, absolute, feed per minute, cutter compensation off, canned cycles off: the
 * modal state every move below assumes, whatever the last program left. Tool length offset is
 * left as it is (no G49): cancelling it would shift a Z axis's work zero by the tool length after
 * the operator has set it.
 */
export function safetyLine(unit: ProgramUnit): string {
  return `G17 ${unit === 'in' ? 'G20' : 'G21'} G90 G94 G40 G80 ${comment(`safety line: XY plane, ${unit === 'in' ? 'inches' : 'millimetres'}, absolute, feed per minute, cutter compensation off, canned cycles off`)}`;
}

const CAUTIONS = [
  'CAUTIONS - the machine moves on its own while this program runs.',
  'Plasma source off so the torch cannot fire, spindle off, laser off.',
  'Moving gantry: keep hands, tools and people clear of the gantry and its pinch points.',
  'Keep the E-stop within reach and check that it stops the machine before starting.',
  'Home the machine first and try the program at a low feed override.',
  'G4 P is seconds on RS-274/NGC controls - some controls read P as milliseconds - check yours.',
  'Follow the makers instructions and local codes for the machine and its wiring.',
];

function header(h: ProgramHeader): string[] {
  const u = unitWord(h.unit);
  return [
    '%',
    comment(`Railwright test program: ${h.title}`),
    comment(`Machine: ${h.machine}`),
    comment(`Axis: ${h.axis} - moves the ${h.letter} word only`),
    comment(`Written: ${h.date}`),
    comment(`WORK ZERO: before running, move the ${h.letter} axis to the end its travel is measured from`),
    comment(`- the negative end, usually the homing end - and set ${h.letter}0 there in the work coordinates in use.`),
    comment(`Positive ${h.letter} moves away from that zero towards the far end. Every position below is from it.`),
    comment(
      `The axis will move between ${h.letter}${coord(h.lowestMm, h.unit)} and ${h.letter}${coord(h.highestMm, h.unit)} ${u}.`,
    ),
    comment(
      h.unit === 'in'
        ? 'Units: inches G20 - every coordinate and feed below is in inches and inches per minute.'
        : 'Units: millimetres G21 - every coordinate and feed below is in mm and mm per minute.',
    ),
    ...h.lines.map(comment),
    ...CAUTIONS.map(comment),
    safetyLine(h.unit),
  ];
}

/** The stop for a reading: optional stop M1, then a dwell for controls with optional stop off. */
function readingStop(label: string, dwellS: number): string[] {
  return [`M1 ${comment(label)}`, ...(dwellS > 0 ? [`G4 P${dwellS}`] : [])];
}

/**
 * Travel trial: take up the backlash by approaching the start from below, then each move goes
 * out from the start in the positive direction, stops for the measurement and comes back (from
 * below again, past the start by the overrun, so every measurement starts the same way).
 */
export function travelTrialProgram(p: TravelProgramInput): string {
  const L = p.letter;
  const u = p.unit;
  const F = feed(p.feedMmPerMin, u);
  const out = header(p);
  out.push(
    `G0 ${L}${coord(p.startMm - p.overrunMm, u)}`,
    `G1 ${L}${coord(p.startMm, u)} F${F}`,
    ...readingStop('Zero or mark the indicator, rule or tape at the start', p.dwellS),
  );
  p.distancesMm.forEach((d, i) => {
    out.push(comment(`Move ${i + 1} of ${p.distancesMm.length}: ${coord(d, u)} ${unitWord(u)}`));
    out.push(
      `G1 ${L}${coord(p.startMm + d, u)} F${F}`,
      ...readingStop(`Measure the move from the start against ${coord(d, u)} ${unitWord(u)}`, p.dwellS),
    );
    out.push(`G1 ${L}${coord(p.startMm - p.overrunMm, u)} F${F}`, `G1 ${L}${coord(p.startMm, u)} F${F}`);
  });
  out.push('M2', '%');
  return out.join('\n') + '\n';
}

/**
 * Repeat-and-reverse run (the ISO 230-2 linear test cycle): each run up passes the targets in
 * ascending order, each run down in descending order, so every target is approached from its
 * side; the axis reverses beyond the last target by the overrun and comes back, so the first
 * target of each direction is approached the same way as the rest. An optional stop (and a
 * dwell) at each target leaves time for the reading.
 */
export function positioningProgram(p: PositioningProgramInput): string {
  const L = p.letter;
  const u = p.unit;
  const F = feed(p.feedMmPerMin, u);
  const targets = p.targetsMm;
  const low = targets[0] - p.overrunMm;
  const high = targets[targets.length - 1] + p.overrunMm;
  const out = header(p);
  out.push(`G0 ${L}${coord(low, u)}`);
  for (let run = 1; run <= p.runs; run++) {
    out.push(comment(`Run ${run} up`));
    targets.forEach((t, i) =>
      out.push(`G1 ${L}${coord(t, u)} F${F}`, ...readingStop(`read up ${run}, target ${i + 1}`, p.dwellS)),
    );
    out.push(`G1 ${L}${coord(high, u)} F${F} ${comment('overrun, then reverse')}`);
    out.push(comment(`Run ${run} down`));
    for (let i = targets.length - 1; i >= 0; i--)
      out.push(`G1 ${L}${coord(targets[i], u)} F${F}`, ...readingStop(`read down ${run}, target ${i + 1}`, p.dwellS));
    out.push(`G1 ${L}${coord(low, u)} F${F} ${comment('overrun, then reverse')}`);
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
