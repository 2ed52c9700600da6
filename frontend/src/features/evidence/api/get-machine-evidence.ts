import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { evidenceKeys, type Evidence } from '../types';

/** All of a machine's evidence, whatever record it is attached to. */
export const machineEvidenceQueryOptions = (machineId: string) =>
  queryOptions({ queryKey: evidenceKeys.machine(machineId), queryFn: () => api.get<Evidence[]>(`/evidence?machineId=${encodeURIComponent(machineId)}`) });

export const useMachineEvidence = (machineId: string) => useQuery(machineEvidenceQueryOptions(machineId));
