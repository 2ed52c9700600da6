import { fitLine, fitLineThroughOrigin } from './linear-fit.js';
import { referenceCsv, referenceJson } from './reference-data/reference-data.js';
import { expectRelative } from './relative.test-support.js';

function dataset(file: string) {
  const rows = referenceCsv(file);
  return { x: rows.map((r) => Number(r.x)), y: rows.map((r) => Number(r.y)) };
}

describe('least-squares line', () => {
  // NIST StRD linear regression, Norris (certified to 15 significant digits by NIST).
  it('reproduces the NIST StRD Norris certified values', () => {
    const cert = referenceJson('nist_strd_norris_certified.json').certified;
    const { x, y } = dataset('nist_strd_norris.csv');
    expect(x).toHaveLength(36);
    const fit = fitLine(x, y);
    expectRelative(fit.intercept, Number(cert.B0.estimate), 1e-11);
    expectRelative(fit.slope, Number(cert.B1.estimate), 1e-13);
    expectRelative(fit.interceptStdDev, Number(cert.B0.std_dev), 1e-10);
    expectRelative(fit.slopeStdDev, Number(cert.B1.std_dev), 1e-10);
    expectRelative(fit.residualStdDev, Number(cert.residual_std_dev), 1e-10);
    expectRelative(fit.rSquared, Number(cert.r_squared), 1e-13);
    expectRelative(fit.residualSumSq, Number(cert.anova.residual.sum_sq), 1e-10);
    expectRelative(fit.regressionSumSq, Number(cert.anova.regression.sum_sq), 1e-12);
  });

  // NIST StRD NoInt1: fit through the origin, uncentred R² (exact B1 = 251/121).
  it('reproduces the NIST StRD NoInt1 certified values for a fit through the origin', () => {
    const cert = referenceJson('nist_strd_noint1_certified.json').certified;
    const { x, y } = dataset('nist_strd_noint1.csv');
    const fit = fitLineThroughOrigin(x, y);
    expectRelative(fit.slope, 251 / 121, 1e-14);
    expectRelative(fit.slope, Number(cert.B1.estimate), 1e-13);
    expectRelative(fit.slopeStdDev, Number(cert.B1.std_dev), 1e-11);
    expectRelative(fit.residualStdDev, Number(cert.residual_std_dev), 1e-11);
    expectRelative(fit.rSquared, Number(cert.r_squared), 1e-13);
    expectRelative(fit.residualSumSq, Number(cert.anova.residual.sum_sq), 1e-11);
    expectRelative(fit.regressionSumSq, Number(cert.anova.regression.sum_sq), 1e-13);
  });

  // NIST StRD NoInt2: three points through the origin (exact B1 = 8/11).
  it('reproduces the NIST StRD NoInt2 certified values', () => {
    const cert = referenceJson('nist_strd_noint2_certified.json').certified;
    const { x, y } = dataset('nist_strd_noint2.csv');
    const fit = fitLineThroughOrigin(x, y);
    expectRelative(fit.slope, 8 / 11, 1e-14);
    expectRelative(fit.slopeStdDev, Number(cert.B1.std_dev), 1e-11);
    expectRelative(fit.residualStdDev, Number(cert.residual_std_dev), 1e-11);
    expectRelative(fit.rSquared, Number(cert.r_squared), 1e-13);
    expectRelative(fit.residualSumSq, Number(cert.residual_sum_sq), 1e-11);
  });

  it('keeps full precision for large station values with tiny readings', () => {
    // Readings of exactly 1e-6·x + 0.002 at stations far from zero: the fit must recover them.
    const x = [100000, 100250, 100500, 100750, 101000];
    const y = x.map((v) => 1e-6 * v + 0.002);
    const fit = fitLine(x, y);
    expectRelative(fit.slope, 1e-6, 1e-8);
    expect(fit.residualSumSq).toBeLessThan(1e-24);
  });
});
