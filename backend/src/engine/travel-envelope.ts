import { EngineInputError } from './engine-input-error.js';
import { requireNonNegative, requirePositive, requireFiniteResult } from './validate.js';

/**
 * Travel envelope: whether each axis's measured travel covers the sheet or work size it must
 * reach, plus a clearance at each end (all mm).
 */

export interface AxisTravel {
  axis: string;
  measuredTravelMm: number;
  /** Size of the sheet or work along this axis. */
  workSizeMm: number;
}

export interface TravelEnvelopeInput {
  axes: readonly AxisTravel[];
  /** Clearance wanted beyond the work at each end of every axis. */
  marginPerSideMm?: number;
}

export interface AxisTravelResult extends AxisTravel {
  requiredTravelMm: number;
  /** measured − required; negative when the axis falls short. */
  spareMm: number;
  covers: boolean;
}

export interface TravelEnvelopeResult {
  axes: AxisTravelResult[];
  marginPerSideMm: number;
  coversAll: boolean;
}

export function evaluateTravelEnvelope(input: TravelEnvelopeInput): TravelEnvelopeResult {
  const margin = input.marginPerSideMm == null ? 0 : requireNonNegative('marginPerSide', input.marginPerSideMm);
  if (!Array.isArray(input.axes) || input.axes.length === 0) {
    throw new EngineInputError('axes must list at least one axis', 'axes');
  }
  const seen = new Set<string>();
  const axes = input.axes.map((a, i) => {
    if (typeof a?.axis !== 'string' || a.axis.trim() === '') {
      throw new EngineInputError(`axes[${i}].axis must name the axis`, 'axes');
    }
    if (seen.has(a.axis)) throw new EngineInputError(`axis ${a.axis} is listed twice`, 'axes');
    seen.add(a.axis);
    const measured = requireNonNegative(`axes[${i}].measuredTravel`, a.measuredTravelMm);
    const work = requirePositive(`axes[${i}].workSize`, a.workSizeMm);
    const required = work + 2 * margin;
    return {
      axis: a.axis,
      measuredTravelMm: measured,
      workSizeMm: work,
      requiredTravelMm: required,
      spareMm: measured - required,
      covers: measured >= required,
    };
  });
  return requireFiniteResult('axes', { axes, marginPerSideMm: margin, coversAll: axes.every((a) => a.covers) });
}
