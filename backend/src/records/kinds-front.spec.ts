import { historyKinds, recordName } from '../../../frontend/src/lib/record-kinds.js';
import { RECORD_TYPE_NAMES, RECORD_TYPES } from './kinds.js';

/**
 * The browser takes its kinds from this folder's kinds.ts; what it builds from them is held here:
 * the history filter's order and the names the verification page shows.
 */
describe('the browser’s words for kinds', () => {
  it('offers the workshop history its own kinds first, then a machine’s', () => {
    expect(historyKinds('machine').map(([k]) => k)).toEqual(
      RECORD_TYPE_NAMES.filter((k) => RECORD_TYPES[k].history === 'machine'),
    );
    expect(historyKinds('workshop').map(([k]) => k)).toEqual([
      ...RECORD_TYPE_NAMES.filter((k) => RECORD_TYPES[k].history === 'workshop'),
      ...RECORD_TYPE_NAMES.filter((k) => RECORD_TYPES[k].history === 'machine'),
    ]);
    expect(historyKinds('machine')).toContainEqual(['diagonal-check', 'Squareness check']);
  });

  it('names a record by its own name, its evidence name or its label, and an unknown type in words', () => {
    expect(recordName('machine')).toBe('Machine specification');
    expect(recordName('positioning-run')).toBe('Repeat-and-reverse run');
    expect(recordName('waiver')).toBe('Waiver');
    expect(recordName('spindle-run-out')).toBe('spindle run out');
  });
});
