import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { getTableColumns, getTableName } from 'drizzle-orm';
import { canonicalJson } from '../canonical-json.js';
import { SIGNED_RECORD_KINDS, SIGNED_RECORDS } from './signed-record-kinds.js';
import { upgradeSignedContent } from './signed-record-upgrades.js';

/**
 * Every layout a signed table has had, as drizzle-kit recorded it in drizzle/meta after each
 * migration: a row signed in any of them, carried through the upgrade steps, must have exactly
 * today's columns. A migration that adds, drops or renames a column of a signed table without
 * its upgrade step fails here (and would otherwise make every earlier approval read as changed).
 */
const META = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../../../../drizzle/meta');
const FIRST_SIGNED_LAYOUT = 7; // migration 0007 began keeping the signed copy of each record

type Snapshot = { tables: Record<string, { columns: Record<string, { name: string }> }> };
const snapshots = readdirSync(META)
  .filter((f) => /^\d{4}_snapshot\.json$/.test(f) && Number(f.slice(0, 4)) >= FIRST_SIGNED_LAYOUT)
  .sort()
  .map((f) => ({ tag: f.slice(0, 4), snapshot: JSON.parse(readFileSync(path.join(META, f), 'utf8')) as Snapshot }));

const camel = (name: string) => name.replace(/_([a-z0-9])/g, (_, c: string) => c.toUpperCase());

describe('rows signed in an earlier layout', () => {
  it('finds the migration snapshots', () => {
    expect(snapshots.length).toBeGreaterThan(20);
  });

  for (const kind of SIGNED_RECORD_KINDS) {
    const spec = SIGNED_RECORDS[kind];
    const table = getTableName(spec.table);
    const today = getTableColumns(spec.table);
    const propertyOf = new Map(Object.entries(today).map(([key, col]) => [col.name, key]));

    it(`${kind}: a row of every earlier layout of ${table} is carried to today's columns`, () => {
      const layouts = snapshots.filter((s) => s.snapshot.tables[`public.${table}`]);
      expect(layouts.length).toBeGreaterThan(0);
      for (const { tag, snapshot } of layouts) {
        const row = Object.fromEntries(
          Object.values(snapshot.tables[`public.${table}`].columns).map((c) => [
            propertyOf.get(c.name) ?? camel(c.name),
            'mm',
          ]),
        );
        const text = canonicalJson({ records: { [`${kind}:x`]: { kind, id: 'x', row } } });
        const upgraded = JSON.parse(upgradeSignedContent(text)) as {
          records: Record<string, { row: Record<string, unknown> }>;
        };
        expect([tag, Object.keys(upgraded.records[`${kind}:x`].row).sort()]).toEqual([tag, Object.keys(today).sort()]);
      }
    });

    if (spec.children) {
      const child = getTableName(spec.children.table);
      it(`${kind}: its child rows (${child}) have kept one layout, as no upgrade step covers them`, () => {
        const now = Object.values(getTableColumns(spec.children!.table))
          .map((c) => c.name)
          .sort();
        for (const { tag, snapshot } of snapshots.filter((s) => s.snapshot.tables[`public.${child}`])) {
          expect([
            tag,
            Object.values(snapshot.tables[`public.${child}`].columns)
              .map((c) => c.name)
              .sort(),
          ]).toEqual([tag, now]);
        }
      });
    }
  }

  it('leaves a record signed in today’s layout as it is', () => {
    const text = canonicalJson({
      format: 'x',
      records: {
        'rail-sweep:a': {
          kind: 'rail-sweep',
          id: 'a',
          row: { readingUnit: 'um', lengthUnit: 'in', face: 'top', warnings: [] },
        },
      },
    });
    expect(upgradeSignedContent(text)).toBe(text);
  });

  it('carries a travel trial typed in inches to mm as migration 0024 did', () => {
    const text = canonicalJson({
      records: {
        't:a': { kind: 'travel-trial', id: 'a', row: { unit: 'in', moves: [{ commanded: 500, measured: 19.95 }] } },
      },
    });
    const row = JSON.parse(upgradeSignedContent(text)).records['t:a'].row;
    // 19.95 in × 25.4 mm/in = 506.73 mm exactly (1 in = 25.4 mm by definition).
    expect(row).toMatchObject({ readingUnit: 'in', lengthUnit: 'mm', moves: [{ commanded: 500, measured: 506.73 }] });
    expect(row).not.toHaveProperty('unit');
  });
});
