import { Alert, Typography } from '@mui/material';
import type { TargetSet } from '../types';

/**
 * Which machines a change of the set reaches: their readiness boards follow the new values at
 * once, while a standing approval keeps the values it was signed with.
 */
export function TargetSetUsers({ set }: { set: TargetSet }) {
  if (!set.usedBy.length)
    return <Typography color="text.secondary">No machine is judged against this set yet.</Typography>;
  const approved = set.usedBy.filter((m) => m.approved);
  return (
    <Alert severity={approved.length ? 'warning' : 'info'} sx={{ mb: 1.5 }}>
      Machines judged against this set: {set.usedBy.map((m) => m.name).join(', ')}.
      {approved.length > 0 &&
        ` Approved against it: ${approved.map((m) => m.name).join(', ')}. A change shows on their readiness boards at once; their approvals keep the values they were signed with until they are approved again.`}
    </Alert>
  );
}
