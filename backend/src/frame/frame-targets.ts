import { Injectable } from '@nestjs/common';
import { targetIn, type MachineRef, type ReadinessContext } from '../records/readiness.js';
import { TARGET_LABELS, type TargetKey } from '../target-sets/target-keys.js';
import { TargetSetsService } from '../target-sets/target-sets.service.js';
import type { FrameStatus, JudgedTarget } from './frame.mapper.js';

export interface TargetOf {
  target: JudgedTarget;
  /** The target in mm for lengths, otherwise as stored (mm/m). */
  base: number;
}

/** The machine's current target for a frame check, and the verdict of a result against it. */
@Injectable()
export class FrameTargets {
  constructor(private readonly targetSets: TargetSetsService) {}

  async of(machine: Pick<MachineRef, 'workshopId' | 'targetSetId'>, key: TargetKey): Promise<TargetOf> {
    const { target, base } = await this.targetSets.targetFor(machine.workshopId, machine.targetSetId, key);
    return { target: { ...target, label: TARGET_LABELS[key] }, base };
  }
}

/** The same, out of a target set already read for the whole readiness read. */
export function frameTargetIn(context: ReadinessContext, key: TargetKey): TargetOf {
  const { target, base } = targetIn(context, key);
  return { target: { ...target, label: TARGET_LABELS[key] }, base };
}

/** A result at most the target is within it (targets are limits, inclusive). */
export const judge = (value: number, limit: number): FrameStatus =>
  value <= limit ? 'within-target' : 'outside-target';
