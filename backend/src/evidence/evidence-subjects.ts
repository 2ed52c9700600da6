import { BadRequestException, Injectable, NotFoundException } from '@nestjs/common';
import { isEvidenceSubjectType, type EvidenceSubjectType } from '../records/kinds.js';
import { SubjectsRegistry, type SubjectRef } from '../records/subjects.registry.js';

/** Finds what a file is attached to through the subjects registry, in the caller's workshop only. */
@Injectable()
export class EvidenceSubjects {
  constructor(private readonly registry: SubjectsRegistry) {}

  async resolve(
    workshopId: string,
    subjectType: string,
    subjectId: string,
  ): Promise<SubjectRef & { subjectType: EvidenceSubjectType }> {
    const known = this.registry.types();
    if (!isEvidenceSubjectType(subjectType) || !known.includes(subjectType)) {
      throw new BadRequestException([`subjectType must be one of ${known.join(', ')}`]);
    }
    const ref = await this.registry.resolve(workshopId, subjectType, subjectId);
    if (!ref) throw new NotFoundException(`No such ${subjectType} in this workshop`);
    return { ...ref, subjectType };
  }

  /** Current name of a subject, or null when it is gone or its type is no longer registered. */
  async labelOf(workshopId: string, subjectType: string, subjectId: string): Promise<SubjectRef | null> {
    return this.registry.resolve(workshopId, subjectType, subjectId).catch(() => null);
  }
}
