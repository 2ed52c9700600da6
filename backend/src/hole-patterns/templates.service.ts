import { BadRequestException, Injectable } from '@nestjs/common';
import type { SessionUser } from '../auth/session-user.js';
import { MachinesService } from '../machines/machines.service.js';
import { RailsService } from '../rails/rails.service.js';
import { railPattern } from './geometry/rail-pattern.js';
import { HolePatternsService } from './hole-patterns.service.js';
import { layoutSheets, MAX_SHEETS, type PaperKey } from './template/sheet-layout.js';
import { REFERENCE_LABELS, type TemplateInput } from './template/template-drawing.js';
import { renderTemplatePdf } from './template/template-pdf.js';
import { renderTemplateSvg } from './template/template-svg.js';

export interface TemplateFile {
  body: Buffer | string;
  filename: string;
  contentType: string;
}

const mm = (v: number) => `${Number(v.toFixed(2))} mm`;
const slug = (s: string) =>
  s
    .replace(/[^\w-]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .toLowerCase() || 'template';

/** True-scale drilling templates (PDF tiled over paper, SVG in one piece) of a pattern or a rail. */
@Injectable()
export class TemplatesService {
  constructor(
    private readonly patterns: HolePatternsService,
    private readonly rails: RailsService,
    private readonly machines: MachinesService,
  ) {}

  async forPattern(
    actor: SessionUser,
    id: string,
    format: 'pdf' | 'svg',
    paper: PaperKey = 'a4',
  ): Promise<TemplateFile> {
    const row = await this.patterns.findRow(actor, id);
    const machine = await this.machines.getRef(actor, row.machineId);
    const input: TemplateInput = {
      title: row.name,
      machineName: machine.name,
      details: [
        `outline ${mm(row.widthMm)} × ${mm(row.heightMm)}`,
        `${row.holes.length} hole${row.holes.length === 1 ? '' : 's'}`,
        `reference: ${REFERENCE_LABELS[row.reference]}`,
        'x, y from the lower-left corner',
      ],
      widthMm: row.widthMm,
      heightMm: row.heightMm,
      reference: row.reference,
      unit: row.lengthUnit,
      holes: row.holes,
    };
    return render(input, `template-${slug(row.name)}`, format, paper);
  }

  async forRail(
    actor: SessionUser,
    railId: string,
    format: 'pdf' | 'svg',
    paper: PaperKey = 'a4',
  ): Promise<TemplateFile> {
    const rail = await this.rails.get(actor, railId);
    const machine = await this.machines.getRef(actor, rail.machineId);
    const p = railPattern({
      label: rail.label,
      lengthMm: rail.lengthMm,
      profileSizeMm: rail.profileSize,
      typicalBoltSize: rail.typicalBoltSize,
      holePositionsMm: rail.holes.map((h) => h.position),
      holePitchMm: rail.holePitchMm,
      firstHoleMm: rail.firstHoleMm,
    });
    const input: TemplateInput = {
      title: `Rail ${rail.label} (${rail.axis}) — bolt holes`,
      machineName: machine.name,
      details: [
        `rail ${mm(rail.lengthMm)} long, ${mm(p.railWidthMm)} wide`,
        `${p.holes.length} holes at ${mm(rail.holePitchMm)} pitch`,
        `first hole ${mm(rail.firstHoleMm)} and last ${mm(p.endDistanceMm)} from the ends`,
        p.holeNote,
        'reference: the rail’s start (left end)',
      ],
      widthMm: p.widthMm,
      heightMm: p.heightMm,
      reference: 'left',
      unit: 'mm',
      holes: p.holes,
    };
    return render(input, `template-rail-${slug(rail.label)}`, format, paper);
  }
}

async function render(
  input: TemplateInput,
  name: string,
  format: 'pdf' | 'svg',
  paper: PaperKey,
): Promise<TemplateFile> {
  if (format === 'svg')
    return { body: renderTemplateSvg(input), filename: `${name}.svg`, contentType: 'image/svg+xml; charset=utf-8' };
  const layout = layoutSheets(input.widthMm, input.heightMm, paper);
  if (layout.sheets.length > MAX_SHEETS) {
    throw new BadRequestException([
      `paper: this template would take ${layout.sheets.length} sheets of ${layout.paper.name}; at most ${MAX_SHEETS} are printed — use the SVG for a plotter or a larger sheet`,
    ]);
  }
  return {
    body: await renderTemplatePdf(input, layout),
    filename: `${name}-${paper}.pdf`,
    contentType: 'application/pdf',
  };
}
