import { Injectable, OnModuleInit } from '@nestjs/common';
import { UNREADABLE_RESULT } from '../common/stored-result.js';
import { fromMm, isLengthUnit } from '../engine/units.js';
import type { backlashChecks } from '../database/schema/index.js';
import type { CheckRecords } from '../records/check-records.js';
import { CheckRecordsRepository } from '../records/check-records.repository.js';
import { targetIn, type MachineRef, type ReadinessCheck, type ReadinessContext } from '../records/readiness.js';
import { ReadinessRegistry } from '../records/readiness.registry.js';
import { axesOf } from './axes-of-machine.js';
import { TARGET_LABELS } from '../target-sets/target-keys.js';
import { AxesRepository } from './axes.repository.js';
import { backlashStatus, BACKLASH_DEFINITION, storedBacklash, warningsOf } from './backlash.mapper.js';
import { BACKLASH_RECORD, BACKLASH_TABLE } from './backlash.service.js';

/**
 * The backlash check of each axis on the readiness board: the latest check's largest value
 * against the reversal target, its warnings, and (for the certificate) the value at each
 * position with the target as a limit.
 */
@Injectable()
export class BacklashReadinessService implements OnModuleInit {
  private readonly repo: CheckRecords<typeof backlashChecks>;

  constructor(
    private readonly axes: AxesRepository,
    checkRecords: CheckRecordsRepository,
    private readonly readiness: ReadinessRegistry,
  ) {
    this.repo = checkRecords.of(BACKLASH_TABLE);
  }

  onModuleInit() {
    this.readiness.register({ checksFor: (machine, context) => this.checksFor(machine, context) });
  }

  async checksFor(machine: MachineRef, context: ReadinessContext): Promise<ReadinessCheck[]> {
    const rows = await axesOf(this.axes, machine, context);
    if (!rows.length) return [];
    const latest = await this.repo.latest(
      machine.workshopId,
      rows.map((a) => a.id),
    );
    const target = targetIn(context, 'reversal');
    return rows.map((axis): ReadinessCheck => {
      const row = latest.get(axis.id);
      const r = row ? storedBacklash(row.result) : null;
      const unreadable = row !== undefined && r === null;
      const unit = row && isLengthUnit(row.readingUnit) ? row.readingUnit : 'mm';
      const shown = (mm: number) => `${+fromMm(mm, unit).toPrecision(4)} ${unit}`;
      const summary = r
        ? `largest ${shown(r.backlashMm)} at ${+r.worstPositionMm.toFixed(3)} mm of ${r.positions.length} positions (mean ${shown(r.meanBacklashMm)})`
        : unreadable
          ? UNREADABLE_RESULT
          : 'No backlash check recorded yet';
      return {
        key: `backlash:${axis.id}`,
        kind: 'backlash',
        subject: unreadable ? `Axis ${axis.name} (latest backlash check unreadable)` : `Axis ${axis.name}`,
        status: r ? backlashStatus(r.backlashMm, target) : unreadable ? 'outside-target' : 'not-started',
        target: { ...target.target, label: `${TARGET_LABELS.reversal} ≤ ${target.target.value} ${target.target.unit}` },
        result: r ? { value: fromMm(r.backlashMm, unit), unit, summary } : null,
        recordType: row ? BACKLASH_RECORD : null,
        recordId: row?.id ?? null,
        recordedAt: row?.createdAt.toISOString() ?? null,
        place: { machineId: machine.id, axisId: axis.id },
        warnings: r ? warningsOf(r, row!.resolution, unit, target) : [],
        ...(r && context.series
          ? {
              series: {
                title: `Backlash at each position. ${BACKLASH_DEFINITION}`,
                x: { label: 'Position', unit: 'mm' },
                y: { label: 'Backlash', unit: 'um' },
                lines: [
                  {
                    label: 'Backlash',
                    points: r.positions.map((p): [number, number] => [p.positionMm, p.backlashMm * 1000]),
                  },
                ],
                limits: [{ label: 'Target', value: target.base * 1000 }],
              },
            }
          : {}),
      };
    });
  }
}
