import { sql, type SQL } from 'drizzle-orm';
import type { AnyPgColumn } from 'drizzle-orm/pg-core';
import { approvals } from '../database/schema/index.js';
import type { MachineState } from '../database/schema/machines.js';

/**
 * The state a machine reads as now, for repositories' selects. The stored state stays
 * "ready-to-cut" while an approval stands; once the standing approval's re-check date has passed
 * the machine reads as "recheck-due", worked out from that date and the statement's time, so a
 * read never writes. (A "recheck-due" stored by an older version is read as it is.)
 */
export function machineStateNow(machine: { id: AnyPgColumn | SQL; state: AnyPgColumn | SQL }): SQL<MachineState> {
  return sql<MachineState>`case when ${machine.state} = 'ready-to-cut' and exists (
      select 1 from ${approvals} rw_a where rw_a.machine_id = ${machine.id} and rw_a.ended_at is null and rw_a.recheck_due_at <= now()
    ) then 'recheck-due' else ${machine.state} end`;
}
