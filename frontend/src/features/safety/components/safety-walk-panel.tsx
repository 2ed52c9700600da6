import { useState } from 'react';
import { Alert, Box, Button, Chip, Paper, Stack, Typography } from '@mui/material';
import AddOutlined from '@mui/icons-material/AddOutlined';
import { LoadingState } from '../../../components/states/loading-state';
import { ErrorState } from '../../../components/states/error-state';
import { palette } from '../../../theme/theme';
import { useMe } from '../../../lib/session/get-me';
import { canCalibrate, canManageTargets } from '../../../lib/session/roles';
import { useAnswerSafetyItem } from '../api/answer-safety-item';
import { useSafetyWalk } from '../api/get-safety-walk';
import { useStartSafetyWalk } from '../api/start-safety-walk';
import type { WalkStatus } from '../types';
import { AddSafetyItemDialog } from './add-safety-item-dialog';
import { SafetyCautions } from './safety-cautions';
import { SafetyItemRow } from './safety-item-row';

const STATUS: Record<WalkStatus, { label: string; color: string }> = {
  'not-started': { label: 'Not started', color: palette.notStarted },
  'within-target': { label: 'Complete', color: palette.within },
  'outside-target': { label: 'Not complete', color: palette.outside },
};

/** The machine file's safety walk: cautions, each section's items with their answers, workshop items. */
export function SafetyWalkPanel({ machineId }: { machineId: string }) {
  const walk = useSafetyWalk(machineId);
  const role = useMe().data?.role;
  const answer = useAnswerSafetyItem(machineId);
  const startNew = useStartSafetyWalk(machineId);
  const [adding, setAdding] = useState(false);
  if (walk.isPending) return <LoadingState label="Loading the safety walk…" />;
  if (walk.isError) return <ErrorState error={walk.error} onRetry={() => walk.refetch()} />;
  const w = walk.data;
  const canAnswer = canCalibrate(role) && !w.locked;
  const look = STATUS[w.status];

  return (
    <Stack spacing={2.5}>
      <SafetyCautions />
      <Paper sx={{ p: { xs: 2, md: 2.5 } }}>
        <Box sx={{ display: 'flex', gap: 1.5, alignItems: 'center', flexWrap: 'wrap', mb: 1 }}>
          <Typography variant="h3" sx={{ flex: '1 1 auto' }}>
            Safety walk
          </Typography>
          <Chip
            label={look.label}
            sx={{ bgcolor: look.color, color: '#fff', fontWeight: 600 }}
            data-testid="walk-status"
          />
          {canManageTargets(role) && (
            <Button startIcon={<AddOutlined />} onClick={() => setAdding(true)}>
              Add a workshop item
            </Button>
          )}
        </Box>
        <Typography color="text.secondary" data-testid="walk-counts">
          {w.counts.answered} of {w.counts.total} answered · {w.counts.yes} yes · {w.counts.no} no · {w.counts.na} not
          applicable. The walk is complete when every item is answered and none is “no”.
        </Typography>
        {!canCalibrate(role) && (
          <Typography variant="body2" color="text.secondary" sx={{ mt: 0.5 }}>
            Technicians, owners and admins answer the walk.
          </Typography>
        )}
        {w.blocking && (
          <Alert severity="error" sx={{ mt: 1.5 }}>
            {w.counts.no === 1 ? 'One item is answered “no”' : `${w.counts.no} items are answered “no”`}: the machine
            cannot be approved until each is put right and answered again.
          </Alert>
        )}
        {w.locked && (
          <Alert
            severity="info"
            sx={{ mt: 1.5 }}
            action={
              canCalibrate(role) ? (
                <Button color="inherit" onClick={() => startNew.mutate()}>
                  Start a new walk
                </Button>
              ) : undefined
            }
          >
            This walk is part of an approved commissioning record and can no longer be changed.
          </Alert>
        )}
        {answer.error && (
          <Alert severity="error" sx={{ mt: 1.5 }} onClose={() => answer.reset()}>
            {answer.error.message}
          </Alert>
        )}
        {w.sections.map((s) => (
          <Box key={s.id} component="section" aria-label={s.label} sx={{ mt: 2.5 }}>
            <Typography variant="h4" component="h4" sx={{ mb: 0.5 }}>
              {s.label}
            </Typography>
            <Stack spacing={0.75} divider={<Box sx={{ borderTop: '1px solid #ece8de' }} />}>
              {s.items.map((item) => (
                <SafetyItemRow
                  key={item.id}
                  item={item}
                  canAnswer={canAnswer}
                  busy={answer.sendingItemId === item.id}
                  onAnswer={(a, note) =>
                    answer.mutate({ itemId: item.id, itemText: item.text, answer: a, note: note.trim() || undefined })
                  }
                />
              ))}
            </Stack>
          </Box>
        ))}
      </Paper>
      <AddSafetyItemDialog open={adding} onClose={() => setAdding(false)} />
    </Stack>
  );
}
