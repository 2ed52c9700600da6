import { Injectable } from '@nestjs/common';
import type { TargetValue } from '../database/schema/target-sets.js';
import { TargetSetsService } from '../target-sets/target-sets.service.js';
import type { TargetKey } from '../target-sets/target-keys.js';

export type DriveTargetKey = Extract<TargetKey, 'stepsPerMmError' | 'positioningAccuracy' | 'repeatability' | 'reversal' | 'screwSpeedHeadroom' | 'travelMargin'>;
const KEYS: DriveTargetKey[] = ['stepsPerMmError', 'positioningAccuracy', 'repeatability', 'reversal', 'screwSpeedHeadroom', 'travelMargin'];

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

  async forMachine(machine: { workshopId: string; targetSetId: string }): Promise<DriveTargets> {
    const entries = await Promise.all(KEYS.map(async (k) => [k, await this.targetSets.targetFor(machine.workshopId, machine.targetSetId, k)] as const));
    return Object.fromEntries(entries) as DriveTargets;
  }
}
