import { EngineInputError } from './engine-input-error.js';
import { requireFinite } from './validate.js';

/**
 * Referring a length measurement to the reference temperature of 20 °C (ISO 1). A length grows
 * with temperature as ΔL = α · L · ΔT. A scale (tape, rule) that is warmer than 20 °C has its
 * graduations spread, so it reads short by α_scale · L · (T_scale − 20); a machine (its screw,
 * rack and frame) that is warmer than 20 °C moves long by α_machine · L · (T_machine − 20). A
 * length L read on the scale is the machine's length at 20 °C plus nothing more than
 *   L · (α_scale · (T_scale − 20) − α_machine · (T_machine − 20))
 * to first order (the product terms are below 10⁻⁶ of L for any workshop temperature).
 */

export const REFERENCE_TEMPERATURE_C = 20;

export const SCALE_MATERIALS = ['steel', 'stainless-steel', 'aluminium', 'glass', 'invar'] as const;
export type ScaleMaterial = (typeof SCALE_MATERIALS)[number];

/** Linear expansion coefficients, µm per metre per kelvin (= 10⁻⁶/K), with where each comes from. */
export const EXPANSION: Readonly<Record<ScaleMaterial, { umPerMK: number; source: string }>> = {
  steel: { umPerMK: 11.5, source: 'TRADE.md: steel α ≈ 11–12 µm/m·K, common practice (11.5 taken)' },
  'stainless-steel': { umPerMK: 17.3, source: 'austenitic stainless steel (304), from memory' },
  aluminium: { umPerMK: 23.1, source: 'aluminium, from memory' },
  glass: { umPerMK: 8.5, source: 'glass scale, from memory' },
  invar: { umPerMK: 1.2, source: 'invar (FeNi36), from memory' },
};

/** The machine's screws, racks and frame are taken as steel. */
export const MACHINE_MATERIAL: ScaleMaterial = 'steel';

export interface ThermalInput {
  machineTemperatureC?: number | null;
  scaleTemperatureC?: number | null;
  /** Steel when absent (a steel tape or rule). */
  scaleMaterial?: ScaleMaterial | null;
}

export interface ThermalReference {
  /** True when both temperatures are known and the correction is applied. */
  applied: boolean;
  /** Temperature of the machine while measuring, °C. */
  machineTemperatureC: number | null;
  /** Temperature of the scale while measuring, °C. */
  scaleTemperatureC: number | null;
  scaleMaterial: ScaleMaterial;
  /** Expansion coefficient of the scale, µm per metre per kelvin (µm/(m·K)). */
  scaleAlphaUmPerMK: number;
  /** Expansion coefficient of the machine, µm per metre per kelvin (µm/(m·K)). */
  machineAlphaUmPerMK: number;
  /** Add factor · L to a length L read on the scale to get the machine's length at 20 °C (a ratio, no unit). */
  factor: number;
  source: string;
}

/** ΔL = α · L · ΔT, with α in µm/m·K and L in mm: the change of length in mm. */
export function lengthChangeMm(alphaUmPerMK: number, lengthMm: number, deltaK: number): number {
  return alphaUmPerMK * 1e-6 * lengthMm * deltaK;
}

const TEMPERATURE_RANGE_C = [-40, 80] as const;

function temperature(field: string, value: number | null | undefined): number | null {
  if (value === undefined || value === null) return null;
  const t = requireFinite(field, value);
  if (t < TEMPERATURE_RANGE_C[0] || t > TEMPERATURE_RANGE_C[1]) {
    throw new EngineInputError(
      `${field} must be between ${TEMPERATURE_RANGE_C[0]} and ${TEMPERATURE_RANGE_C[1]} °C (got ${t})`,
      field,
    );
  }
  return t;
}

/** The factor that refers lengths read on the scale to the machine at 20 °C (0 without both temperatures). */
export function thermalReference(input: ThermalInput): ThermalReference {
  const machineT = temperature('machineTemperature', input.machineTemperatureC);
  const scaleT = temperature('scaleTemperature', input.scaleTemperatureC);
  const material = input.scaleMaterial ?? 'steel';
  if (!(SCALE_MATERIALS as readonly string[]).includes(material)) {
    throw new EngineInputError(`scaleMaterial must be one of ${SCALE_MATERIALS.join(', ')}`, 'scaleMaterial');
  }
  const scale = EXPANSION[material];
  const machine = EXPANSION[MACHINE_MATERIAL];
  const applied = machineT !== null && scaleT !== null;
  const factor = applied
    ? lengthChangeMm(scale.umPerMK, 1, scaleT - REFERENCE_TEMPERATURE_C) -
      lengthChangeMm(machine.umPerMK, 1, machineT - REFERENCE_TEMPERATURE_C)
    : 0;
  return {
    applied,
    machineTemperatureC: machineT,
    scaleTemperatureC: scaleT,
    scaleMaterial: material,
    scaleAlphaUmPerMK: scale.umPerMK,
    machineAlphaUmPerMK: machine.umPerMK,
    factor,
    source: `ΔL = α·L·ΔT referred to 20 °C (ISO 1); scale ${material}: ${scale.source}; machine steel: ${machine.source}`,
  };
}
