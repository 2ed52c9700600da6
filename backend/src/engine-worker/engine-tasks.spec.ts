import { evaluateStraightness } from '../engine/straightness.js';
import { randomRailSweep } from '../engine/seeded-random.js';
import { runEngineTask } from './engine-tasks.js';

// The check is the engine itself, called directly: leaving the residuals out must change nothing else.
describe('engine tasks', () => {
  const sweep = randomRailSweep(6_000, 3);
  const input = { positionsMm: sweep.positionsMm, readingsMm: sweep.readingsMm };

  it('a straightness task answers as the engine does, residuals included unless left out', () => {
    const direct = evaluateStraightness(input);
    expect(runEngineTask({ kind: 'straightness', input })).toEqual(direct);
    const without = runEngineTask({ kind: 'straightness', input, residuals: false }) as typeof direct;
    for (const line of ['leastSquares', 'minimumZone', 'endPoint'] as const) {
      expect(direct[line].residualsMm).toHaveLength(6_000);
      expect(without[line].residualsMm).toEqual([]);
      expect({ ...without[line], residualsMm: null }).toEqual({ ...direct[line], residualsMm: null });
    }
  });
});
