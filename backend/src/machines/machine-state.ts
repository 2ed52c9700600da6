import { sql, type SQL } from 'drizzle-orm';
import { approvals, machines } from '../database/schema/index.js';
import type { MachineState } from '../database/schema/machines.js';

/**
 * The state a machine reads as now, for repositories' selects (`row` names the machines row: the
 * table itself, or the alias of a hand-written query). The stored state stays "ready-to-cut"
 * while an approval stands; once the standing approval's re-check date has passed the machine
 * reads as "recheck-due", worked out from that date and the statement's time, so a read never
 * writes. (A "recheck-due" stored by an older version is read as it is.)
 */
export function machineStateNow(row: SQL = sql`${machines}`): SQL<MachineState> {
  // Qualified on purpose: a select from the machines table alone leaves its columns unqualified,
  // and an unqualified "id" inside the subquery would be the approval's.
  return sql<MachineState>`case when ${row}.state = 'ready-to-cut' and exists (
      select 1 from ${approvals} rw_a where rw_a.machine_id = ${row}.id and rw_a.ended_at is null and rw_a.recheck_due_at <= now()
    ) then 'recheck-due' else ${row}.state end`;
}
