import PDFDocument from 'pdfkit';
import type { ApprovalSnapshot, BoardCheck } from '../snapshot.js';
import { KIND_LABELS, STATUS_LABELS } from '../board.js';
import { CHECK_KINDS } from '../../records/kinds.js';
import { cautionsFor } from '../cautions.js';
import { bedMapLayout, drawBedMap } from './bed-map.js';
import { drawResultGauge, drawSeriesChart, drawSquarenessSketch, legendRows } from './charts.js';
import { drawPartTable, partRows, partTableHeight } from './part-table.js';
import { certificateFonts, type FontName } from './fonts.js';
import { dayOf, resultText, targetText, utc } from './format.js';
import { BRASS, INK, MUTED, PAPER, RULE, STATUS_COLOURS, STEEL, WARNING_INK } from './palette.js';
import { write } from './pdf-text.js';
import { drawQrCode } from './qr-code.js';

export interface CertificateInput {
  snapshot: ApprovalSnapshot;
  approval: {
    id: string;
    approvedAt: Date;
    approvedBy: string;
    statement: string;
    recordHash: string;
    recheckDueAt: Date;
  };
  /** Public address where anyone can check the signature; null for approvals signed before signatures were kept. */
  verificationUrl: string | null;
}

type Doc = PDFKit.PDFDocument;
const M = 48;
const PAGE = { w: 595.28, h: 841.89 };
const BOTTOM = PAGE.h - M - 20;
const WIDTH = PAGE.w - 2 * M;
const KIND_LINES = { plasma: 'Plasma table', router: 'Router', other: 'Gantry machine' } as Record<string, string>;

/**
 * The commissioning certificate, drawn only from the approval's stored snapshot. Dates and the
 * document id come from the approval, so the same approval always gives the same bytes.
 */
export function renderCertificate(input: CertificateInput): Promise<Buffer> {
  const { snapshot: s, approval: a } = input;
  const doc = new PDFDocument({
    size: 'A4',
    margin: M,
    bufferPages: true,
    autoFirstPage: true,
    compress: true,
    info: {
      Title: `Commissioning certificate \u2014 ${s.machine.name}`,
      Author: a.approvedBy,
      Subject: `Approval ${a.id}, record hash ${a.recordHash}`,
      Creator: 'Railwright',
      Producer: 'Railwright',
      CreationDate: a.approvedAt,
      ModDate: a.approvedAt,
    },
  });
  for (const [name, data] of Object.entries(certificateFonts())) doc.registerFont(name, data);
  const chunks: Buffer[] = [];
  doc.on('data', (c: Buffer) => chunks.push(c));
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });

  header(doc, s, a);
  checksTable(doc, s.checks);
  waivers(doc, s.checks);
  charts(doc, s.checks, s.machine.workArea);
  signature(doc, a);
  cautions(doc, s.machine.kind);
  verification(doc, s, a, input.verificationUrl);
  footers(doc, s, a);
  doc.end();
  return done;
}

function ensure(doc: Doc, height: number) {
  if (doc.y + height > BOTTOM) {
    doc.addPage();
    doc.y = M;
  }
}

function heading(doc: Doc, text: string) {
  ensure(doc, 60);
  doc.moveDown(0.8);
  doc.fillColor(STEEL);
  write(doc, 'bold', 12, text, M, doc.y);
  doc
    .save()
    .lineWidth(1)
    .strokeColor(BRASS)
    .moveTo(M, doc.y + 2)
    .lineTo(M + WIDTH, doc.y + 2)
    .stroke()
    .restore();
  doc.y += 8;
  doc.fillColor(INK);
}

function para(doc: Doc, text: string, font: FontName = 'regular', size = 9, colour = INK) {
  doc.fillColor(colour);
  write(doc, font, size, text, M, doc.y, { width: WIDTH, lineGap: 1.5 });
  doc.fillColor(INK);
}

function header(doc: Doc, s: ApprovalSnapshot, a: CertificateInput['approval']) {
  doc.save().rect(0, 0, PAGE.w, 118).fill(STEEL).restore();
  doc.fillColor('#ffffff');
  write(doc, 'medium', 9, `RAILWRIGHT \u00b7 ${s.workshop.name}`, M, 30, { width: WIDTH, characterSpacing: 0.6 });
  write(doc, 'bold', 22, 'Commissioning certificate', M, 46, { width: WIDTH });
  write(
    doc,
    'regular',
    11,
    `${s.machine.name} \u00b7 ${KIND_LINES[s.machine.kind] ?? s.machine.kind} \u00b7 work area ${s.machine.workArea.x} \u00d7 ${s.machine.workArea.y} mm`,
    M,
    78,
    { width: WIDTH },
  );
  doc.fillColor(INK);
  doc.y = 134;
  const box = { x: M, y: doc.y, w: WIDTH, h: 74 };
  doc.save().rect(box.x, box.y, box.w, box.h).fill(PAPER).restore();
  doc.save().rect(box.x, box.y, 4, box.h).fill(STATUS_COLOURS['within-target']).restore();
  const col = (label: string, value: string, x: number, y: number, w: number) => {
    doc.fillColor(MUTED);
    write(doc, 'medium', 7, label.toUpperCase(), x, y, { width: w, characterSpacing: 0.4 });
    doc.fillColor(INK);
    write(doc, 'regular', 9.5, value, x, y + 10, { width: w });
  };
  col('Approved as ready to cut by', a.approvedBy, box.x + 14, box.y + 10, 170);
  col('Approved on', utc(a.approvedAt), box.x + 190, box.y + 10, 140);
  col(
    'Re-check due by',
    `${dayOf(a.recheckDueAt)} (every ${s.targetSet.recheckIntervalDays} days)`,
    box.x + 340,
    box.y + 10,
    160,
  );
  col('Target set', s.targetSet.name, box.x + 14, box.y + 40, 170);
  col('Record hash (SHA-256)', a.recordHash.replace(/(.{32})/, '$1 '), box.x + 190, box.y + 40, 310);
  doc.y = box.y + box.h + 4;
  const counts = countOf(s.checks);
  doc.moveDown(0.6);
  const summary = counts.waived
    ? `${s.checks.length} required checks: ${counts.within} within target, ${counts.waived} waived by an owner with a written reason.`
    : `${s.checks.length} required checks, all within target.`;
  para(doc, summary, 'regular', 9, MUTED);
  const warned = s.checks.filter((c) => c.warnings?.length).length;
  if (warned)
    para(
      doc,
      `${warned} ${warned === 1 ? 'check carries' : 'checks carry'} warnings, printed under ${warned === 1 ? 'it' : 'each'} below.`,
      'regular',
      9,
      WARNING_INK,
    );
}

const countOf = (checks: BoardCheck[]) => ({
  within: checks.filter((c) => c.status === 'within-target').length,
  waived: checks.filter((c) => c.status === 'waived').length,
});

const COLS = [
  { title: 'Check', w: 108 },
  { title: 'Subject', w: 112 },
  { title: 'Result', w: 90 },
  { title: 'Target', w: 95 },
  { title: 'State', w: 94 },
];

function checksTable(doc: Doc, checks: BoardCheck[]) {
  heading(doc, 'Checks the approval was based on');
  const headerRow = () => {
    let x = M;
    const y = doc.y;
    doc.fillColor(MUTED);
    for (const c of COLS) {
      write(doc, 'medium', 7.5, c.title.toUpperCase(), x + 3, y, { width: c.w - 6, lineBreak: false });
      x += c.w;
    }
    doc.y = y + 12;
    doc
      .save()
      .lineWidth(0.8)
      .strokeColor(INK)
      .moveTo(M, doc.y)
      .lineTo(M + WIDTH, doc.y)
      .stroke()
      .restore();
    doc.y += 4;
    doc.fillColor(INK);
  };
  headerRow();
  for (const c of checks) {
    const cells = [KIND_LABELS[c.kind], c.subject, resultText(c), targetText(c), STATUS_LABELS[c.status]];
    doc.font('regular').fontSize(8.5);
    const h = Math.max(...cells.map((t, i) => doc.heightOfString(t, { width: COLS[i].w - 6 }))) + 8;
    if (doc.y + h > BOTTOM) {
      doc.addPage();
      doc.y = M;
      headerRow();
    }
    const y = doc.y;
    let x = M;
    cells.forEach((t, i) => {
      if (i === 4) {
        doc
          .save()
          .circle(x + 6, y + 5, 3)
          .fill(STATUS_COLOURS[c.status])
          .restore();
        doc.fillColor(STATUS_COLOURS[c.status]);
        write(doc, 'medium', 8.5, t, x + 13, y, { width: COLS[i].w - 16 });
        doc.fillColor(INK);
      } else write(doc, i === 2 ? 'medium' : 'regular', 8.5, t, x + 3, y, { width: COLS[i].w - 6 });
      x += COLS[i].w;
    });
    doc.y = y + h - 4;
    if (c.result?.summary) {
      doc.fillColor(MUTED);
      write(doc, 'regular', 7, c.result.summary, M + COLS[0].w + 3, doc.y - 2, { width: WIDTH - COLS[0].w - 6 });
      doc.fillColor(INK);
      doc.y += 2;
    }
    checkWarnings(doc, c);
    doc
      .save()
      .lineWidth(0.4)
      .strokeColor(RULE)
      .moveTo(M, doc.y)
      .lineTo(M + WIDTH, doc.y)
      .stroke()
      .restore();
    doc.y += 4;
  }
}

/** Every warning of a check, under its row: what a reader should know about the number above it. */
function checkWarnings(doc: Doc, c: BoardCheck) {
  const x = M + COLS[0].w + 3;
  const w = WIDTH - COLS[0].w - 6;
  for (const warning of c.warnings ?? []) {
    const text = `Warning: ${warning.message}`;
    doc.font('regular').fontSize(7.5);
    const h = doc.heightOfString(text, { width: w - 8, lineGap: 1 }) + 3;
    if (doc.y + h > BOTTOM) {
      doc.addPage();
      doc.y = M;
    }
    const y = doc.y;
    doc
      .save()
      .rect(x, y + 1, 2, h - 4)
      .fill(BRASS)
      .restore();
    doc.fillColor(WARNING_INK);
    write(doc, 'regular', 7.5, text, x + 7, y, { width: w - 8, lineGap: 1 });
    doc.fillColor(INK);
    doc.y = y + h;
  }
}

function waivers(doc: Doc, checks: BoardCheck[]) {
  const waived = checks.filter((c) => c.waiver);
  heading(doc, 'Waivers');
  if (!waived.length) return para(doc, 'No check was waived: every check was within its target.', 'regular', 9, MUTED);
  for (const c of waived) {
    ensure(doc, 40);
    const was = c.result ? `${STATUS_LABELS[c.measuredStatus].toLowerCase()}, ${resultText(c)}` : 'not started';
    write(doc, 'medium', 9, `${KIND_LABELS[c.kind]} \u2014 ${c.subject} (${was})`, M, doc.y, { width: WIDTH });
    para(doc, `\u201c${c.waiver!.reason}\u201d`, 'italic', 9);
    para(doc, `Waived by ${c.waiver!.by} on ${utc(c.waiver!.at)}`, 'regular', 7.5, MUTED);
    doc.moveDown(0.4);
  }
}

/** Kinds charted even without a series: the result is drawn against its target instead. */

function charts(doc: Doc, checks: BoardCheck[], workArea: { x: number; y: number }) {
  // A check with nothing recorded (waived before it was started) has nothing to draw; the table says so.
  const charted = checks.filter((c) => c.series || (CHECK_KINDS[c.kind]?.gauge && c.result));
  heading(doc, 'Charts and tables of the results');
  if (!charted.length)
    return para(
      doc,
      'This machine had no rail, positioning, backlash, squareness, bed or test-cut results to chart.',
      'regular',
      9,
      MUTED,
    );
  for (const c of charted) {
    const title = `${KIND_LABELS[c.kind]} \u2014 ${c.subject}`;
    const s = c.series && withoutSubject(c.series, c.subject);
    const bed = s && c.kind === 'bed-grid' ? bedMapLayout(s) : null;
    const parts = s && c.kind === 'test-cut' ? partRows(s) : null;
    const sketch = !s && c.kind === 'diagonal-check' && c.result?.unit === 'mm/m';
    const h = bed
      ? bed.height
      : parts
        ? partTableHeight(doc, WIDTH, parts)
        : s
          ? 170 + (legendRows(doc, s, WIDTH - 56) - 1) * 9
          : sketch
            ? 110
            : c.result && c.target
              ? 66
              : 24;
    doc.font('medium').fontSize(9);
    const titleH = doc.heightOfString(`${title}${s?.title ? `: ${s.title}` : ''}`, { width: WIDTH });
    ensure(doc, h + titleH + 14);
    write(doc, 'medium', 9, title, M, doc.y, { width: WIDTH, continued: !!s?.title });
    if (s?.title) doc.font('regular').text(`: ${s.title}`, { width: WIDTH });
    const box = { x: M, y: doc.y + 4, w: WIDTH, h };
    if (bed && s) drawBedMap(doc, box, s, bed);
    else if (parts && s) drawPartTable(doc, box, s, parts);
    else if (s)
      drawSeriesChart(doc, box, s, {
        valueLabels: c.kind === 'backlash' || s.lines.every((l) => l.points.length <= 1),
      });
    else if (sketch) drawSquarenessSketch(doc, box, c, workArea);
    else drawResultGauge(doc, box, c);
    doc.y = box.y + h + 10;
  }
}

/** A series title that repeats the subject ("Rail Y1 (left): residuals…") keeps only what it adds. */
function withoutSubject(s: NonNullable<BoardCheck['series']>, subject: string) {
  const t = s.title?.trim();
  if (!t || !t.toLowerCase().startsWith(`${subject.toLowerCase()}:`)) return s;
  return { ...s, title: t.slice(subject.length + 1).trim() };
}

function signature(doc: Doc, a: CertificateInput['approval']) {
  heading(doc, 'Statement signed by the approver');
  para(doc, a.statement, 'regular', 9.5);
  doc.moveDown(0.5);
  ensure(doc, 30);
  para(
    doc,
    `Signed by ${a.approvedBy}, by re-entering their password, on ${utc(a.approvedAt)}. Approval ${a.id}.`,
    'medium',
    8.5,
    MUTED,
  );
}

function cautions(doc: Doc, kind: string) {
  heading(doc, 'Safety cautions');
  for (const c of cautionsFor(kind)) {
    ensure(doc, 26);
    const y = doc.y;
    doc
      .save()
      .rect(M, y + 2, 3, 9)
      .fill(BRASS)
      .restore();
    write(doc, 'medium', 8.5, `${c.title}. `, M + 9, y, { width: WIDTH - 9, continued: true });
    doc.font('regular').text(c.text, { width: WIDTH - 9, lineGap: 1 });
    doc.moveDown(0.3);
  }
}

function verification(doc: Doc, s: ApprovalSnapshot, a: CertificateInput['approval'], url: string | null) {
  // The heading stays with its code and address rather than ending a page alone.
  if (url) ensure(doc, 170);
  heading(doc, 'How to verify this certificate');
  if (!url) {
    para(
      doc,
      `Open the machine file of \u201c${s.machine.name}\u201d in Railwright (Readiness tab) and compare the record hash shown there with the one printed here: ${a.recordHash}.`,
      'regular',
      8.5,
    );
    return;
  }
  const qr = 92;
  ensure(doc, qr + 8);
  const top = doc.y;
  drawQrCode(doc, url, M, top, qr, INK);
  const x = M + qr + 14;
  const w = WIDTH - qr - 14;
  doc.fillColor(INK);
  write(
    doc,
    'medium',
    9,
    'Scan the code or open this address to check the certificate, no account needed:',
    x,
    top + 6,
    { width: w },
  );
  doc.fillColor(STEEL);
  write(doc, 'medium', 9, url, x, doc.y + 3, { width: w, link: url });
  doc.fillColor(INK);
  write(
    doc,
    'regular',
    8,
    'The page shows whether the owner\u2019s Ed25519 signature is valid for the record as it is kept now, and names anything changed since it was signed. ' +
      'It also offers the signed record (JSON) and the public key, to check it offline.',
    x,
    doc.y + 4,
    { width: w, lineGap: 1 },
  );
  doc.fillColor(MUTED);
  write(doc, 'regular', 7.5, `Record hash (SHA-256 of the results above): ${a.recordHash}`, x, doc.y + 4, { width: w });
  doc.fillColor(INK);
  doc.y = Math.max(doc.y, top + qr) + 4;
}

function footers(doc: Doc, s: ApprovalSnapshot, a: CertificateInput['approval']) {
  const range = doc.bufferedPageRange();
  for (let i = range.start; i < range.start + range.count; i++) {
    doc.switchToPage(i);
    const y = PAGE.h - M + 10;
    doc
      .save()
      .lineWidth(0.4)
      .strokeColor(RULE)
      .moveTo(M, y - 6)
      .lineTo(M + WIDTH, y - 6)
      .stroke()
      .restore();
    doc.fillColor(MUTED);
    // No page breaks from the footer itself: it sits below the bottom margin.
    const bottom = doc.page.margins.bottom;
    doc.page.margins.bottom = 0;
    write(
      doc,
      'regular',
      7,
      `Commissioning certificate \u00b7 ${s.machine.name} \u00b7 ${s.workshop.name} \u00b7 approval ${a.id.slice(0, 8)}`,
      M,
      y,
      { width: WIDTH - 80, lineBreak: false },
    );
    write(doc, 'regular', 7, `page ${i + 1} of ${range.count}`, M + WIDTH - 80, y, {
      width: 80,
      align: 'right',
      lineBreak: false,
    });
    doc.page.margins.bottom = bottom;
  }
  doc.fillColor(INK);
}
