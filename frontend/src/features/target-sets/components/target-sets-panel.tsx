import { useState } from 'react';
import { Alert, Stack } from '@mui/material';
import { LoadingState } from '../../../components/states/loading-state';
import { ErrorState } from '../../../components/states/error-state';
import { useTargetSets } from '../api/get-target-sets';
import { TargetSetCard } from './target-set-card';
import { EditTargetSetDialog } from './edit-target-set-dialog';

export function TargetSetsPanel({ canEdit }: { canEdit: boolean }) {
  const sets = useTargetSets();
  const [editing, setEditing] = useState<string | null>(null);
  if (sets.isPending) return <LoadingState label="Loading target sets…" />;
  if (sets.isError) return <ErrorState error={sets.error} onRetry={() => sets.refetch()} />;
  const current = sets.data.find((s) => s.id === editing);
  return (
    <Stack spacing={2.5}>
      <Alert severity="info">
        The starting values are common practice, not a standard. Every tolerance depends on rail size, preload, spacing, process and material: set them for your machines.
        {!canEdit && ' Owners and admins change them; you can read them.'}
      </Alert>
      {sets.data.map((s) => (
        <TargetSetCard key={s.id} set={s} canEdit={canEdit} onEdit={() => setEditing(s.id)} />
      ))}
      {current && <EditTargetSetDialog key={current.id} set={current} onClose={() => setEditing(null)} />}
    </Stack>
  );
}
