import { Injectable } from '@nestjs/common';
import type { TargetValue } from '../database/schema/target-sets.js';
import { TargetSetsService } from '../target-sets/target-sets.service.js';
import { targetInBaseUnit, type TargetKey } from '../target-sets/target-keys.js';

export type DriveTargetKey = Extract<
  TargetKey,
  'stepsPerMmError' | 'positioningAccuracy' | 'repeatability' | 'reversal' | 'screwSpeedHeadroom' | 'travelMargin'
>;
const KEYS: DriveTargetKey[] = [
  'stepsPerMmError',
  'positioningAccuracy',
  'repeatability',
  'reversal',
  'screwSpeedHeadroom',
  'travelMargin',
];

/** A target as stored, with its value in mm (lengths) or as stored (%). */
export interface Target {
  target: TargetValue;
  base: number;
}

export type DriveTargets = Record<DriveTargetKey, Target>;

/** The drive-related targets of a machine's current target set, read together. */
@Injectable()
export class DriveTargetsService {
  constructor(private readonly targetSets: TargetSetsService) {}

  /** One read of the target set for every drive target. */
  async forMachine(machine: { workshopId: string; targetSetId: string }): Promise<DriveTargets> {
    const set = await this.targetSets.findRow(machine.workshopId, machine.targetSetId);
    return Object.fromEntries(
      KEYS.map((k) => [k, { target: set.targets[k], base: targetInBaseUnit(set.targets[k]) }]),
    ) as DriveTargets;
  }
}
