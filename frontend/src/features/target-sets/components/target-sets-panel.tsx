import { useState } from 'react';
import { Alert, Box, Button, Stack } from '@mui/material';
import AddOutlined from '@mui/icons-material/AddOutlined';
import { LoadingState } from '../../../components/states/loading-state';
import { ErrorState } from '../../../components/states/error-state';
import { useTargetSets } from '../api/get-target-sets';
import { TargetSetCard } from './target-set-card';
import { EditTargetSetDialog } from './edit-target-set-dialog';
import { NewTargetSetDialog } from './new-target-set-dialog';

export function TargetSetsPanel({ canEdit }: { canEdit: boolean }) {
  const sets = useTargetSets();
  const [editing, setEditing] = useState<string | null>(null);
  const [copying, setCopying] = useState<string | null>(null);
  if (sets.isPending) return <LoadingState label="Loading target sets…" />;
  if (sets.isError) return <ErrorState error={sets.error} onRetry={() => sets.refetch()} />;
  const current = sets.data.find((s) => s.id === editing);
  const copyFrom = sets.data.find((s) => s.id === copying);
  return (
    <Stack spacing={2.5}>
      <Alert severity="info">
        The starting values are common practice, not a standard. Every tolerance depends on rail size, preload, spacing,
        process and material: set them for your machines.
        {!canEdit && ' Owners and admins change them; you can read them.'}
      </Alert>
      {canEdit && sets.data.length > 0 && (
        <Box>
          <Button
            variant="contained"
            startIcon={<AddOutlined />}
            onClick={() => setCopying(sets.data[0].id)}
            sx={{ minHeight: 44 }}
          >
            New target set
          </Button>
        </Box>
      )}
      {sets.data.map((s) => (
        <TargetSetCard
          key={s.id}
          set={s}
          canEdit={canEdit}
          onEdit={() => setEditing(s.id)}
          onCopy={() => setCopying(s.id)}
        />
      ))}
      {current && <EditTargetSetDialog key={current.id} set={current} onClose={() => setEditing(null)} />}
      {copyFrom && (
        <NewTargetSetDialog
          key={copyFrom.id}
          sets={sets.data}
          from={copyFrom}
          onClose={() => setCopying(null)}
          onCreated={() => setCopying(null)}
        />
      )}
    </Stack>
  );
}
