import { queryOptions, useQuery } from '@tanstack/react-query';
import { answer, client } from '../../../lib/api-client';
import { evidenceKeys } from '../types';

/** All of a machine's evidence, whatever record it is attached to. */
export const machineEvidenceQueryOptions = (machineId: string) =>
  queryOptions({
    queryKey: evidenceKeys.machine(machineId),
    queryFn: () => answer(client.GET('/api/evidence', { params: { query: { machineId } } })),
  });

export const useMachineEvidence = (machineId: string) => useQuery(machineEvidenceQueryOptions(machineId));
