import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { evidenceKeys, type Evidence } from '../types';

export const subjectEvidenceQueryOptions = (subjectType: string, subjectId: string) =>
  queryOptions({
    queryKey: evidenceKeys.subject(subjectType, subjectId),
    queryFn: () => api.get<Evidence[]>(`/evidence?subjectType=${encodeURIComponent(subjectType)}&subjectId=${encodeURIComponent(subjectId)}`),
  });

export const useSubjectEvidence = (subjectType: string, subjectId: string) => useQuery(subjectEvidenceQueryOptions(subjectType, subjectId));
