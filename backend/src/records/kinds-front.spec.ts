import * as front from '../../../frontend/src/lib/record-kinds.js';
import { CHECK_KIND_NAMES, CHECK_KINDS, RECORD_TYPE_NAMES, RECORD_TYPES } from './kinds.js';

/**
 * The browser names kinds from its own copy (frontend/src/lib/record-kinds.ts): the same kinds in
 * the same order, with the same words and senses, or a kind added on one side only fails here.
 */
describe('the browser knows every kind the server has', () => {
  it('has every check kind, in the board order, with its label and sense', () => {
    expect(Object.keys(front.CHECK_KINDS)).toEqual(CHECK_KIND_NAMES);
    for (const kind of CHECK_KIND_NAMES) {
      expect([kind, front.CHECK_KINDS[kind]]).toEqual([
        kind,
        { label: CHECK_KINDS[kind].label, sense: CHECK_KINDS[kind].sense },
      ]);
    }
  });

  it('has every record type, in the history order, with its label, evidence name and history filter', () => {
    expect(Object.keys(front.RECORD_TYPES)).toEqual(RECORD_TYPE_NAMES);
    for (const type of RECORD_TYPE_NAMES) {
      const server: { label: string; evidence?: string; history: string | null } = RECORD_TYPES[type];
      const browser: { label: string; evidence?: string; history: string | null } = front.RECORD_TYPES[type];
      expect([type, browser.label, browser.evidence, browser.history]).toEqual([
        type,
        server.label,
        server.evidence,
        server.history,
      ]);
    }
  });

  it('offers the workshop history its own kinds first, then a machine\u2019s', () => {
    expect(front.historyKinds('machine').map(([k]) => k)).toEqual(
      RECORD_TYPE_NAMES.filter((k) => RECORD_TYPES[k].history === 'machine'),
    );
    expect(front.historyKinds('workshop').map(([k]) => k)).toEqual([
      ...RECORD_TYPE_NAMES.filter((k) => RECORD_TYPES[k].history === 'workshop'),
      ...RECORD_TYPE_NAMES.filter((k) => RECORD_TYPES[k].history === 'machine'),
    ]);
  });
});
