import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import { execFileSync } from 'node:child_process';
import { writeFileSync } from 'node:fs';
import { eq } from 'drizzle-orm';
import { createTestApp, createTestWorkshop, TEST_PASSWORD, type TestWorkshop } from './helpers/test-app.js';
import { FakeChecks } from './support/fake-checks.js';
import { board, newMachine, requestAndApprove, waiveAllBut } from './support/approval-flow.js';
import { ReadinessRegistry } from '../src/records/readiness.registry.js';
import type { ReadinessCheck } from '../src/records/readiness.js';
import { DRIZZLE, type Database } from '../src/database/database.tokens.js';
import { approvals } from '../src/database/schema/index.js';

// pdftotext (poppler) reads the certificate back as an independent reader of the PDF.
const pdfText = (pdf: Buffer) => execFileSync('pdftotext', ['-layout', '-', '-'], { input: pdf }).toString('utf8');
const flat = (text: string) => text.replace(/\s+/g, ' ');

const FEW_STATIONS = {
  code: 'few-stations',
  message: 'Only 5 stations were read along 800 mm of rail; 9 or more show a bow.',
};
const COARSE = {
  code: 'coarse-instrument',
  message: 'The indicator reads 10 µm, coarser than a quarter of the 20 µm target.',
};

/** Checks of the kinds the certificate draws as tables or with value labels, in the shapes their modules send. */
function extraChecks(machineId: string): ReadinessCheck[] {
  const base = {
    status: 'within-target' as const,
    recordType: 'test-cut' as const,
    recordedAt: '2026-11-30T10:00:00.000Z',
    place: { machineId, tab: 'readiness' as const },
  };
  return [
    {
      ...base,
      key: 'fake-bed:1',
      kind: 'bed-grid',
      subject: 'Bed',
      recordId: '00000000-0000-4000-8000-000000000001',
      target: { value: 0.75, unit: 'mm' },
      result: { value: 0.62, unit: 'mm', summary: 'range 0.62 mm over 12 points' },
      series: {
        title: 'Bed map: heights relative to the gantry plane, 3 rows by 4 columns',
        x: { label: 'X position', unit: 'mm' },
        y: { label: 'Height', unit: 'mm' },
        lines: [0, 750, 1500].map((y, r) => ({
          label: `Row ${r + 1} · Y = ${y} mm`,
          points: [0, 500, 1000, 1500].map((x, c): [number, number] => [
            x,
            Number((0.05 * r + 0.13 * c + (r === 1 && c === 2 ? 0.3 : 0)).toFixed(2)),
          ]),
        })),
        limits: [{ label: 'Target 0.75 mm', value: 0.75 }],
      },
      warnings: [],
    },
    {
      ...base,
      key: 'fake-cut:1',
      kind: 'test-cut',
      subject: 'Test cut',
      recordId: '00000000-0000-4000-8000-000000000002',
      target: { value: 0.9, unit: 'mm' },
      result: { value: 0.4, unit: 'mm', summary: 'largest deviation 0.4 mm' },
      series: {
        title: 'Test-cut part sizes after kerf: deviation and tolerance',
        x: { label: 'Nominal size', unit: 'mm' },
        y: { label: 'Deviation from nominal', unit: 'mm' },
        lines: [
          { label: 'Square, X side', points: [[400, -0.4]] },
          {
            label: '±1.2 mm: ISO 9013 range 4, 315–1000 mm in 6 mm plate',
            points: [
              [400, -1.2],
              [400, 1.2],
            ],
          },
          { label: 'Circle, X diameter', points: [[100, 0.15]] },
          {
            label: '±0.9 mm: ISO 9013 range 4, 35–125 mm in 6 mm plate',
            points: [
              [100, -0.9],
              [100, 0.9],
            ],
          },
        ],
      },
      warnings: [],
    },
    {
      ...base,
      key: 'fake-backlash:X',
      kind: 'backlash',
      subject: 'Axis X',
      recordId: '00000000-0000-4000-8000-000000000003',
      target: { value: 50, unit: 'um' },
      result: { value: 38, unit: 'um', summary: 'largest 38 µm (middle)' },
      series: {
        title: 'Backlash at each position',
        x: { label: 'Position', unit: 'mm' },
        y: { label: 'Backlash', unit: 'um' },
        lines: [
          {
            label: 'Backlash',
            points: [
              [20, 31],
              [760, 38],
              [1500, 27],
            ],
          },
        ],
        limits: [{ label: 'Target', value: 50 }],
      },
      warnings: [COARSE],
    },
    {
      ...base,
      key: 'fake-positioning:Y',
      kind: 'positioning',
      subject: 'Axis Y',
      recordId: '00000000-0000-4000-8000-000000000004',
      target: { value: 0.1, unit: 'mm' },
      result: { value: 0.06, unit: 'mm', summary: 'accuracy 0.06 mm' },
      series: {
        title: 'Mean deviation at each target with its ±2s band',
        x: { label: 'Target', unit: 'mm' },
        y: { label: 'Deviation', unit: 'um' },
        lines: [
          {
            label: 'Mean up',
            points: [
              [0, 4],
              [750, 12],
              [1500, 9],
            ],
          },
          {
            label: 'Mean up + 2s',
            points: [
              [0, 10],
              [750, 18],
              [1500, 16],
            ],
          },
          {
            label: 'Mean up − 2s',
            points: [
              [0, -2],
              [750, 6],
              [1500, 2],
            ],
          },
          {
            label: 'Mean down',
            points: [
              [0, -8],
              [750, -2],
              [1500, -5],
            ],
          },
        ],
        limits: [
          { label: 'Accuracy target ±50 µm', value: 50 },
          { label: '', value: -50 },
        ],
      },
      warnings: [],
    },
  ];
}

describe('certificate: warnings under their checks, charts and tables from the series', () => {
  let app: NestFastifyApplication;
  let ws: TestWorkshop;
  let fake: FakeChecks;
  let machineId: string;
  let pdf: Buffer;
  let approvalId: string;

  beforeAll(async () => {
    app = await createTestApp();
    fake = new FakeChecks();
    app.get(ReadinessRegistry).register(fake);
    ws = await createTestWorkshop(app, 'Certificate content');
    machineId = await newMachine(ws);
    const checks = fake.seed(machineId);
    checks[0].warnings = [FEW_STATIONS];
    checks.push(...extraChecks(machineId));
  });
  afterAll(() => app.close());

  it('the board lists each check with its warnings (an empty list when it has none)', async () => {
    const b = await board(ws, machineId);
    const checks = b.checks as unknown as { key: string; warnings: unknown[] }[];
    expect(checks.find((c) => c.key === 'fake-straightness:Y1')!.warnings).toEqual([FEW_STATIONS]);
    expect(checks.find((c) => c.key === 'fake-backlash:X')!.warnings).toEqual([COARSE]);
    expect(checks.find((c) => c.key === 'fake-straightness:Y2')!.warnings).toEqual([]);
  });

  it('the approval snapshot keeps the warnings, and the certificate prints each under its check', async () => {
    await waiveAllBut(ws, machineId, (key) => key.startsWith('fake-'));
    approvalId = (await requestAndApprove(ws, machineId, TEST_PASSWORD)).id;
    const [row] = await app.get<Database>(DRIZZLE).select().from(approvals).where(eq(approvals.id, approvalId));
    expect(row.snapshot.checks.find((c) => c.key === 'fake-straightness:Y1')!.warnings).toEqual([FEW_STATIONS]);
    expect(row.snapshot.checks.find((c) => c.key === 'fake-backlash:X')!.warnings).toEqual([COARSE]);

    const res = await ws.as.viewer
      .get(`/api/machines/${machineId}/certificate.pdf`)
      .buffer(true)
      .parse((r, cb) => {
        const chunks: Buffer[] = [];
        r.on('data', (c: Buffer) => chunks.push(c));
        r.on('end', () => cb(null, Buffer.concat(chunks)));
      });
    expect(res.status).toBe(200);
    pdf = res.body as Buffer;
    if (process.env.CERTIFICATE_PDF_OUT) writeFileSync(process.env.CERTIFICATE_PDF_OUT, pdf);
    const text = flat(pdfText(pdf));
    expect(text).toContain(`Warning: ${FEW_STATIONS.message}`);
    expect(text).toContain(`Warning: ${COARSE.message}`);
    expect(text).toMatch(/2 checks carry warnings, printed under each below/);
    // Each warning sits under its own check: after its row, before the next check's row.
    const y1 = text.indexOf('Rail Y1 (left)');
    const y2 = text.indexOf('Rail Y2 (right)');
    const warned = text.indexOf(FEW_STATIONS.message);
    expect(y1).toBeGreaterThan(-1);
    expect(warned).toBeGreaterThan(y1);
    expect(warned).toBeLessThan(y2 > y1 ? y2 : text.length);
  });

  it('the certificate draws the bed map with each height, the test-cut table and the backlash values', () => {
    const text = flat(pdfText(pdf));
    expect(text).toMatch(/Charts and tables of the results/);
    // Bed map: row labels and the heights of row 2 (0.05, 0.18, 0.61 with its high spot, 0.44).
    expect(text).toMatch(/Row 2 · Y = 750 mm 0\.05 0\.18 0\.61 0\.44/);
    expect(text).toMatch(/lowest 0, highest 0\.61, range 0\.61 mm/);
    // Test-cut table: part, nominal, signed deviation, tolerance, verdict, basis.
    expect(text).toMatch(/Square, X side 400 -0\.4 1\.2 within ISO 9013 range 4, 315–1000 mm/);
    expect(text).toMatch(/Circle, X diameter 100 \+0\.15 0\.9 within/);
    // Backlash: a value on each point.
    for (const v of ['31', '38', '27']) expect(text).toMatch(new RegExp(`\\b${v}\\b`));
    expect(text).toMatch(/Mean up \+ 2s/);
    // Only the check sent without a series (the seeded positioning run of axis X) falls back to its gauge.
    expect(text.match(/no chart data/g)).toHaveLength(1);
    expect(text).toMatch(/Repeat-and-reverse run — Axis X no chart data — the result against its target/);
  });
});
