import { EngineInputError } from './engine-input-error.js';
import { requireNonNegative, requirePositive, requireFiniteResult } from './validate.js';

/**
 * Ball-screw speed check: the screw's rotational speed at a feed rate against its permissible
 * speed from whirling (critical speed) and against its d·n limit.
 *
 * Convention: THK Ball Screw General Catalog, "Permissible Rotational Speed", equation (7):
 *   N1 = λ2 · d1 / lb² · 10⁷   (rpm; d1 root diameter, lb unsupported length, mm)
 * whose factors λ2 already contain the catalogue's 0.8 safety factor, so N1 is the permissible
 * speed. The critical (whirling) speed is the same expression without that factor, N1 / 0.8.
 * The safety factor is therefore applied exactly once.
 */

export const MOUNTINGS = ['fixed-free', 'supported-supported', 'fixed-supported', 'fixed-fixed'] as const;
export type Mounting = (typeof MOUNTINGS)[number];

/** THK λ2 end-fixity factors (0.8 safety factor included). */
export const THK_LAMBDA2: Readonly<Record<Mounting, number>> = {
  'fixed-free': 3.4,
  'supported-supported': 9.7,
  'fixed-supported': 15.1,
  'fixed-fixed': 21.9,
};

export const CATALOGUE_SAFETY_FACTOR = 0.8;
/** d·n limit for rolled screws (nominal diameter mm × rpm), unless the maker states another. */
export const DEFAULT_DN_LIMIT = 70_000;

export const SCREW_SPEED_SOURCE =
  'THK Ball Screw General Catalog, permissible rotational speed, equation (7): N1 = λ2·d1/lb²·10⁷ ' +
  'with λ2 = 3.4 / 9.7 / 15.1 / 21.9 (fixed-free / supported-supported / fixed-supported / fixed-fixed), ' +
  'safety factor 0.8 included in λ2; critical speed = N1 / 0.8; d·n limit 70 000 for rolled screws unless given';

export interface ScrewSpeedInput {
  nominalDiameterMm: number;
  rootDiameterMm: number;
  unsupportedLengthMm: number;
  leadMm: number;
  mounting: Mounting;
  feedRateMmPerMin: number;
  /** Nominal diameter (mm) × rpm the nut is rated for; 70 000 when absent. */
  dnLimit?: number;
}

export interface ScrewSpeedResult {
  rpm: number;
  criticalSpeedRpm: number;
  permissibleSpeedRpm: number;
  dnLimitSpeedRpm: number;
  maxFeedRateMmPerMin: number;
  withinLimits: boolean;
  /** The lower of the permissible (whirling) speed and the d·n limit speed: the speed headroom is taken from. */
  limitSpeedRpm: number;
  /** How far the speed stays below that lower limit, % of it (negative above it). */
  headroomPercent: number;
  /** Which limit sets the top speed. */
  limitedBy: 'critical-speed' | 'dn-limit';
  mountingFactor: number;
  dnLimit: number;
  source: string;
}

export function evaluateScrewSpeed(input: ScrewSpeedInput): ScrewSpeedResult {
  const nominal = requirePositive('nominalDiameter', input.nominalDiameterMm);
  const root = requirePositive('rootDiameter', input.rootDiameterMm);
  const length = requirePositive('unsupportedLength', input.unsupportedLengthMm);
  const lead = requirePositive('lead', input.leadMm);
  const feed = requireNonNegative('feedRate', input.feedRateMmPerMin);
  const dnLimit = input.dnLimit == null ? DEFAULT_DN_LIMIT : requirePositive('dnLimit', input.dnLimit);
  if (!(MOUNTINGS as readonly string[]).includes(input.mounting)) {
    throw new EngineInputError(`mounting must be one of ${MOUNTINGS.join(', ')}`, 'mounting');
  }
  if (root > nominal) {
    throw new EngineInputError('rootDiameter must not be larger than nominalDiameter', 'rootDiameter');
  }

  const factor = THK_LAMBDA2[input.mounting];
  const permissible = ((factor * root) / (length * length)) * 1e7;
  const critical = permissible / CATALOGUE_SAFETY_FACTOR;
  const dnLimitSpeed = dnLimit / nominal;
  const rpm = feed / lead;
  const top = Math.min(permissible, dnLimitSpeed);
  return requireFiniteResult('the screw and feed values', {
    rpm,
    criticalSpeedRpm: critical,
    permissibleSpeedRpm: permissible,
    dnLimitSpeedRpm: dnLimitSpeed,
    maxFeedRateMmPerMin: lead * top,
    limitSpeedRpm: top,
    headroomPercent: (1 - rpm / top) * 100,
    withinLimits: rpm <= permissible && rpm <= dnLimitSpeed,
    limitedBy: permissible <= dnLimitSpeed ? 'critical-speed' : 'dn-limit',
    mountingFactor: factor,
    dnLimit,
    source: SCREW_SPEED_SOURCE,
  });
}
