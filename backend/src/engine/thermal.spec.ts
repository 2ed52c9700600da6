import { EXPANSION, lengthChangeMm, thermalReference } from './thermal.js';
import { EngineInputError } from './engine-input-error.js';

describe('referring lengths to 20 °C', () => {
  // TRADE.md (common practice): "steel grows about 0.1 mm per metre per 10 °C (α ≈ 11–12 µm/m·K)".
  it('ΔL = α·L·ΔT: a metre of steel 10 K warmer grows 0.11–0.12 mm', () => {
    const dl = lengthChangeMm(EXPANSION.steel.umPerMK, 1000, 10);
    expect(dl).toBeGreaterThanOrEqual(0.11);
    expect(dl).toBeLessThanOrEqual(0.12);
    // Handbook formula evaluated by hand: 11.5e-6 /K × 1000 mm × 10 K = 0.115 mm.
    expect(dl).toBeCloseTo(0.115, 12);
  });

  // Same material at the same temperature: scale and machine grow alike, nothing to correct
  // (the reason ISO 230-2 practice uses a scale of the machine's own material when it can).
  it('a steel tape on a steel machine at one temperature needs no correction', () => {
    expect(
      thermalReference({ machineTemperatureC: 31, scaleTemperatureC: 31, scaleMaterial: 'steel' }).factor,
    ).toBeCloseTo(0, 15);
  });

  // ΔL = α·L·ΔT for each part by hand: aluminium rule at 30 °C reads 23.1e-6 × 10 short per mm;
  // the steel machine at 20 °C is as built. 1000 mm read → machine length 1000.231 mm at 20 °C.
  it('an aluminium rule 10 K warm reads short by α·L·ΔT', () => {
    const t = thermalReference({ machineTemperatureC: 20, scaleTemperatureC: 30, scaleMaterial: 'aluminium' });
    expect(t.applied).toBe(true);
    expect(1000 * t.factor).toBeCloseTo(0.231, 12);
  });

  it('a warm machine read with a scale at 20 °C moves long: the correction takes α·L·ΔT off', () => {
    const t = thermalReference({ machineTemperatureC: 28, scaleTemperatureC: 20 });
    expect(1000 * t.factor).toBeCloseTo(-11.5e-6 * 1000 * 8, 12);
  });

  it('without both temperatures nothing is corrected; temperatures outside −40…80 °C are refused', () => {
    expect(thermalReference({ machineTemperatureC: 25 }).applied).toBe(false);
    expect(thermalReference({ machineTemperatureC: 25 }).factor).toBe(0);
    expect(() => thermalReference({ machineTemperatureC: 250, scaleTemperatureC: 20 })).toThrow(EngineInputError);
  });
});
