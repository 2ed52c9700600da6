import { Injectable } from '@nestjs/common';
import { isEvidenceSubjectType, type EvidenceSubjectType, type SignedRecordType } from './kinds.js';

/** Where a record sits: its machine, and whether approvals may lock it. */
export interface SubjectRef {
  machineId: string;
  /** The record type as used by RecordsService locks ("rail-sweep", "travel-trial", …). */
  recordType: SignedRecordType;
  recordId: string;
  label: string;
}

export type SubjectResolver = (workshopId: string, id: string) => Promise<SubjectRef | null>;

/**
 * Lets modules that attach things to any record (evidence) find that record without importing
 * every domain module: each domain registers its subject types ("rail", "axis", "rail-sweep"…).
 */
@Injectable()
export class SubjectsRegistry {
  private readonly resolvers = new Map<EvidenceSubjectType, SubjectResolver>();

  register(subjectType: EvidenceSubjectType, resolver: SubjectResolver): void {
    this.resolvers.set(subjectType, resolver);
  }

  types(): EvidenceSubjectType[] {
    return [...this.resolvers.keys()].sort();
  }

  /** null when the type is unknown or the record is not in this workshop. */
  async resolve(workshopId: string, subjectType: string, id: string): Promise<SubjectRef | null> {
    const resolver = isEvidenceSubjectType(subjectType) ? this.resolvers.get(subjectType) : undefined;
    return resolver ? resolver(workshopId, id) : null;
  }
}
