import { Alert, Button, Stack } from '@mui/material';
import type { Role } from '../../auth/types';
import type { Readiness } from '../types';
import { dateOnly, dateTime } from '../format';

const mayRequest = (role: Role) => role === 'technician' || role === 'owner' || role === 'admin';

interface Props {
  readiness: Readiness;
  role: Role;
  requesting: boolean;
  onRequest: () => void;
  onApprove: () => void;
}

/** What the machine's state allows next, for this role; and what the state means. */
export function ReadinessActions({ readiness: r, role, requesting, onRequest, onApprove }: Props) {
  const canRequest = mayRequest(role) && (r.state === 'being-built' || r.state === 'recheck-due');
  const canApprove = role === 'owner' && r.state === 'awaiting-approval';
  return (
    <Stack spacing={1.5}>
      {r.state === 'awaiting-approval' && r.request && (
        <Alert severity="info">
          {r.request.requestedBy} requested approval on {dateTime(r.request.requestedAt)}. {role === 'owner' ? 'Review the checks below, then sign.' : 'An owner reviews and signs.'}
        </Alert>
      )}
      {r.state === 'recheck-due' && (
        <Alert severity="warning">
          The re-check was due by {r.recheckDueAt ? dateOnly(r.recheckDueAt) : 'now'}. Record a new round of checks, compare it under “What drifted”, then request approval again.
        </Alert>
      )}
      {(canRequest || canApprove) && (
        <Stack direction="row" spacing={1}>
          {canRequest && (
            <Button variant="contained" onClick={onRequest} disabled={requesting}>
              Request approval
            </Button>
          )}
          {canApprove && (
            <Button variant="contained" color="secondary" onClick={onApprove}>
              Approve…
            </Button>
          )}
        </Stack>
      )}
    </Stack>
  );
}
