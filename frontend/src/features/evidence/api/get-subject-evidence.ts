import { queryOptions, useQuery } from '@tanstack/react-query';
import { answer, client } from '../../../lib/api-client';
import { evidenceKeys } from '../types';

export const subjectEvidenceQueryOptions = (subjectType: string, subjectId: string) =>
  queryOptions({
    queryKey: evidenceKeys.subject(subjectType, subjectId),
    queryFn: () => answer(client.GET('/api/evidence', { params: { query: { subjectType, subjectId } } })),
  });

export const useSubjectEvidence = (subjectType: string, subjectId: string) =>
  useQuery(subjectEvidenceQueryOptions(subjectType, subjectId));
