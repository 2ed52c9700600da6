import { expect, test } from '@playwright/test';
import { historyKinds, recordName } from '../frontend/src/lib/record-kinds';
import { RECORD_TYPE_NAMES, RECORD_TYPES } from '../backend/src/records/kinds';

// The browser takes its kinds from the server's list (backend/src/records/kinds.ts); what it
// builds from them is held here: the history filter's order and the names the verification page
// shows. Runs in Node: no page is opened.

test('the workshop history offers its own kinds first, then a machine’s', () => {
  expect(historyKinds('machine').map(([k]) => k)).toEqual(
    RECORD_TYPE_NAMES.filter((k) => RECORD_TYPES[k].history === 'machine'),
  );
  expect(historyKinds('workshop').map(([k]) => k)).toEqual([
    ...RECORD_TYPE_NAMES.filter((k) => RECORD_TYPES[k].history === 'workshop'),
    ...RECORD_TYPE_NAMES.filter((k) => RECORD_TYPES[k].history === 'machine'),
  ]);
  expect(historyKinds('machine')).toContainEqual(['diagonal-check', 'Squareness check']);
});

test('a record is named by its own name, its evidence name or its label; an unknown type in words', () => {
  expect(recordName('machine')).toBe('Machine specification');
  expect(recordName('positioning-run')).toBe('Repeat-and-reverse run');
  expect(recordName('waiver')).toBe('Waiver');
  expect(recordName('spindle-run-out')).toBe('spindle run out');
});
