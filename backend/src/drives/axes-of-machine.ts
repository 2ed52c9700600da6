import { readOnce, type MachineRef, type ReadinessContext } from '../records/readiness.js';
import type { AxesRepository, AxisRow } from './axes.repository.js';

/** A machine's axes as the drives' readiness contributors read them: once per evaluation. */
export const axesOf = (repo: AxesRepository, machine: MachineRef, context: ReadinessContext): Promise<AxisRow[]> =>
  readOnce(context, `axes:${machine.id}`, () => repo.list(machine.workshopId, machine.id));
