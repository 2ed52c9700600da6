import { Alert, Button, Stack } from '@mui/material';
import type { Role } from '../../../lib/session/user';
import type { Readiness } from '../types';
import { dateOnly, dateTime } from '../format';

const mayRequest = (role: Role) => role === 'technician' || role === 'owner' || role === 'admin';

interface Props {
  readiness: Readiness;
  role: Role;
  requesting: boolean;
  onRequest: () => void;
  onApprove: () => void;
  onReopen: () => void;
}

/** What the machine's state allows next, for this role; and what the state means. */
export function ReadinessActions({ readiness: r, role, requesting, onRequest, onApprove, onReopen }: Props) {
  const canRequest = mayRequest(role) && (r.state === 'being-built' || r.state === 'reopened');
  const canApprove = role === 'owner' && r.state === 'awaiting-approval';
  // Only while an approval stands: reopening is what makes its records editable again.
  const stands = (r.state === 'ready-to-cut' || r.state === 'recheck-due') && !!r.approval && !r.approval.reopened;
  const canReopen = role === 'owner' && stands;
  return (
    <Stack spacing={1.5}>
      {r.state === 'awaiting-approval' && r.request && (
        <Alert severity="info">
          {r.request.requestedBy} requested approval on {dateTime(r.request.requestedAt)}.{' '}
          {role === 'owner' ? 'Review the checks below, then sign.' : 'An owner reviews and signs.'}
        </Alert>
      )}
      {r.state === 'recheck-due' && (
        <Alert severity="warning">
          The re-check was due by {r.recheckDueAt ? dateOnly(r.recheckDueAt) : 'now'}.{' '}
          {role === 'owner' ? 'Reopen the machine' : 'An owner reopens the machine'} for the re-check round, record the
          checks again, compare them under “What drifted”, then request approval again.
        </Alert>
      )}
      {r.state === 'reopened' && r.approval?.reopened && (
        <Alert severity="info">
          Reopened for changes{r.approval.reopened.by ? ` by ${r.approval.reopened.by}` : ''} on{' '}
          {dateTime(r.approval.reopened.at)}: “{r.approval.reopened.reason?.replace(/[.\s]+$/, '')}”. Record what
          changed, then request approval again.
        </Alert>
      )}
      {(canRequest || canApprove || canReopen) && (
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
          {canReopen && (
            <Button variant="outlined" color="warning" onClick={onReopen}>
              Reopen for changes…
            </Button>
          )}
        </Stack>
      )}
    </Stack>
  );
}
