import { Readable } from 'node:stream';
import sharp from 'sharp';
import { EvidenceUploadService } from '../backend/src/evidence/evidence-upload.service.js';
import { RailsService } from '../backend/src/rails/rails.service.js';
import type { SeedContext } from './context.js';

/*
 * Invented evidence: simple drawn pictures standing in for workshop photos (a dial indicator on
 * a rail carriage, the welded frame, the squaring marks), and one CSV of readings. They go
 * through the same checks as an upload from the browser.
 */

const picture = (body: string) =>
  sharp(Buffer.from(`<svg xmlns="http://www.w3.org/2000/svg" width="1600" height="1200">${body}</svg>`))
    .jpeg({ quality: 82 })
    .toBuffer();

const indicatorOnRail = () =>
  picture(`<rect width="1600" height="1200" fill="#6f7d7a"/>
    <rect x="60" y="640" width="1480" height="110" fill="#c9cfcd"/><rect x="60" y="750" width="1480" height="40" fill="#3c4543"/>
    ${[200, 440, 680, 920, 1160, 1400].map((x) => `<circle cx="${x}" cy="695" r="16" fill="#2b3331"/>`).join('')}
    <rect x="560" y="520" width="340" height="120" rx="14" fill="#2b3331"/>
    <rect x="716" y="400" width="34" height="130" fill="#1e2624"/>
    <circle cx="733" cy="270" r="150" fill="#f6f4ef" stroke="#1e2624" stroke-width="18"/>
    <line x1="733" y1="270" x2="815" y2="175" stroke="#b3261e" stroke-width="10"/>`);

const weldedFrame = () =>
  picture(`<rect width="1600" height="1200" fill="#9aa3a0"/>
    <rect x="160" y="260" width="1280" height="60" fill="#4a5350"/><rect x="160" y="860" width="1280" height="60" fill="#4a5350"/>
    <rect x="160" y="260" width="60" height="660" fill="#3c4543"/><rect x="1380" y="260" width="60" height="660" fill="#3c4543"/>
    <rect x="780" y="260" width="40" height="660" fill="#56605d"/>
    <rect x="200" y="920" width="50" height="220" fill="#2b3331"/><rect x="1350" y="920" width="50" height="220" fill="#2b3331"/>`);

const squaringMarks = () =>
  picture(`<rect width="1600" height="1200" fill="#c9c3b4"/>
    <rect x="200" y="200" width="1200" height="800" fill="none" stroke="#3c4543" stroke-width="30"/>
    <line x1="215" y1="215" x2="1385" y2="985" stroke="#c8932a" stroke-width="8" stroke-dasharray="40 18"/>
    <line x1="1385" y1="215" x2="215" y2="985" stroke="#c8932a" stroke-width="8" stroke-dasharray="40 18"/>
    <circle cx="215" cy="215" r="26" fill="#b3261e"/><circle cx="1385" cy="985" r="26" fill="#b3261e"/>
    <circle cx="1385" cy="215" r="26" fill="#1d4f4a"/><circle cx="215" cy="985" r="26" fill="#1d4f4a"/>`);

const readingsCsv =
  'station_mm,reading_thou\n0,0.0\n400,1.5\n800,2.5\n1200,3.5\n1600,4.0\n2000,3.5\n2400,2.5\n2800,1.0\n3200,0.0\n';

export async function seedEvidence(ctx: SeedContext): Promise<void> {
  if (!ctx.machines) throw new Error('seedEvidence needs the machines seeded first');
  // Subject types are registered in onModuleInit; the seed may run before the server listens.
  await ctx.app.init();
  const evidence = ctx.app.get(EvidenceUploadService);
  const { builder, technician } = ctx.demo.people;
  const file = (name: string, body: Buffer | string) => ({ name, stream: Readable.from([Buffer.from(body)]) });
  try {
    await evidence.attach(
      builder,
      { subjectType: 'machine', subjectId: ctx.machines.router, caption: 'Router frame before the gantry went on' },
      file('router-frame.jpg', await weldedFrame()),
    );
    // On the router's final Y1 sweep: the approval that follows locks it, so this photo is kept.
    const routerRails = await ctx.app.get(RailsService).list(builder, ctx.machines.router);
    const routerSweep = routerRails.find((r) => r.label.startsWith('Y1'))?.latestSweep;
    if (routerSweep) {
      await evidence.attach(
        builder,
        { subjectType: 'rail-sweep', subjectId: routerSweep.id, caption: 'Indicator set-up for the final Y1 sweep' },
        file('router-y1-sweep.jpg', await indicatorOnRail()),
      );
    }
    const plasma = ctx.machines.plasma;
    await evidence.attach(
      builder,
      { subjectType: 'machine', subjectId: plasma, caption: 'Frame welded and levelled on its feet, before the rails' },
      file('frame-on-feet.jpg', await weldedFrame()),
    );
    await evidence.attach(
      technician,
      { subjectType: 'machine', subjectId: plasma, caption: 'Tram marks for the diagonals' },
      file('squaring-marks.jpg', await squaringMarks()),
    );
    const rails = await ctx.app.get(RailsService).list(builder, plasma);
    const y1 = rails.find((r) => r.label.startsWith('Y1'));
    if (y1) {
      await evidence.attach(
        builder,
        { subjectType: 'rail', subjectId: y1.id, caption: 'Dial indicator riding on the Y1 carriage' },
        file('y1-indicator.jpg', await indicatorOnRail()),
      );
      await evidence.attach(
        builder,
        { subjectType: 'rail', subjectId: y1.id, caption: 'As-found readings from the notebook' },
        file('y1-as-found.csv', readingsCsv),
      );
    }
  } catch (err) {
    // Storage that does not answer (an S3 bucket not made yet) must not stop the demo seed.
    console.warn(`Demo evidence skipped: ${(err as Error).message}`);
  }
}
