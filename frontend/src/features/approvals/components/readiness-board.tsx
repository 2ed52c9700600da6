import { useState } from 'react';
import { Box, Paper, Stack, ToggleButton, ToggleButtonGroup, Typography } from '@mui/material';
import { LoadingState } from '../../../components/states/loading-state';
import { ErrorState } from '../../../components/states/error-state';
import { EmptyState } from '../../../components/states/empty-state';
import { ApiError } from '../../../lib/api-client';
import { useMe } from '../../../lib/session/get-me';
import { useReadiness } from '../api/get-readiness';
import { useRequestApproval } from '../api/request-approval';
import type { BlockingCheck, BoardCheck } from '../types';
import { ApprovalSummary } from './approval-summary';
import { ApproveDialog } from './approve-dialog';
import { BlockingAlert } from './blocking-alert';
import { ChecksTable } from './checks-table';
import { DriftTable } from './drift-table';
import { ReadinessActions } from './readiness-actions';
import { ReopenDialog } from './reopen-dialog';
import { WaiverDialog } from './waiver-dialog';

/** The readiness board: every required check at a glance, and the way to approval. */
export function ReadinessBoard({ machineId, machineName }: { machineId: string; machineName: string }) {
  const readiness = useReadiness(machineId);
  const me = useMe();
  const request = useRequestApproval(machineId);
  const [waiving, setWaiving] = useState<BoardCheck | null>(null);
  const [approving, setApproving] = useState(false);
  const [reopening, setReopening] = useState(false);
  const [view, setView] = useState<'checks' | 'drift'>('checks');

  if (readiness.isPending) return <LoadingState label="Gathering the checks…" />;
  if (readiness.isError) return <ErrorState error={readiness.error} onRetry={() => readiness.refetch()} />;
  const r = readiness.data;
  const role = me.data?.role ?? 'viewer';
  const refusal = request.error instanceof ApiError ? request.error : null;
  const refusedBlocking = ((refusal?.body as { blocking?: BlockingCheck[] } | null)?.blocking ?? []) as BlockingCheck[];
  const current = r.state === 'ready-to-cut' || r.state === 'recheck-due';

  return (
    <Stack spacing={2}>
      <Paper sx={{ p: 2 }}>
        <Stack
          direction={{ xs: 'column', sm: 'row' }}
          spacing={2}
          sx={{ justifyContent: 'space-between', alignItems: { sm: 'center' } }}
        >
          <Box>
            <Typography variant="h3" component="h2">
              Readiness
            </Typography>
            <Typography color="text.secondary" data-testid="readiness-counts">
              {r.counts.within} of {r.counts.total} within target · {r.counts.waived} waived · {r.counts.outside}{' '}
              outside · {r.counts.notStarted} not started — judged against {r.targetSet.name}
            </Typography>
          </Box>
          <ReadinessActions
            readiness={r}
            role={role}
            requesting={request.isPending}
            onRequest={() => request.mutate()}
            onApprove={() => setApproving(true)}
            onReopen={() => setReopening(true)}
          />
        </Stack>
      </Paper>
      {refusal && (
        <BlockingAlert message={refusal.message} blocking={refusedBlocking} onClose={() => request.reset()} />
      )}
      {r.approval && <ApprovalSummary machineId={machineId} approval={r.approval} current={current} />}
      {r.approval && (
        <ToggleButtonGroup
          exclusive
          size="small"
          value={view}
          onChange={(_, v) => v && setView(v)}
          aria-label="Board view"
        >
          <ToggleButton value="checks">Checks</ToggleButton>
          <ToggleButton value="drift">What drifted</ToggleButton>
        </ToggleButtonGroup>
      )}
      {view === 'drift' && r.approval ? (
        <DriftTable machineId={machineId} />
      ) : r.checks.length ? (
        <ChecksTable
          checks={r.checks}
          onWaive={role === 'owner' && r.state !== 'awaiting-approval' ? setWaiving : undefined}
        />
      ) : (
        <EmptyState title="No required checks yet">
          Add the machine’s rails and axes: each brings its checks to this board.
        </EmptyState>
      )}
      <WaiverDialog machineId={machineId} check={waiving} onClose={() => setWaiving(null)} />
      {reopening && r.approval && (
        <ReopenDialog
          machineId={machineId}
          machineName={machineName}
          approval={r.approval}
          onClose={() => setReopening(false)}
        />
      )}
      {approving && <ApproveDialog open onClose={() => setApproving(false)} machineName={machineName} readiness={r} />}
    </Stack>
  );
}
