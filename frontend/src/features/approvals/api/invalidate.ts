import type { QueryClient } from '@tanstack/react-query';
import { machineKeys } from '../../../lib/machine-keys';
import { approvalKeys } from '../types';

/** After any change of readiness the machine's state, list and history change too. */
export function invalidateMachine(qc: QueryClient, machineId: string) {
  return Promise.all([
    qc.invalidateQueries({ queryKey: approvalKeys.all }),
    qc.invalidateQueries({ queryKey: machineKeys.detail(machineId) }),
    qc.invalidateQueries({ queryKey: machineKeys.list() }),
    qc.invalidateQueries({ queryKey: machineKeys.history(machineId) }),
  ]);
}
