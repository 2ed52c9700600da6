import { Box, Chip, Paper, Stack, Typography } from '@mui/material';
import { useMe } from '../../../lib/session/get-me';
import { canRecord } from '../../../lib/session/roles';
import { useMachineEvidence } from '../api/get-machine-evidence';
import { LoadingState } from '../../../components/states/loading-state';
import { ErrorState } from '../../../components/states/error-state';
import { EmptyState } from '../../../components/states/empty-state';
import { subjectTypeLabel } from '../subject-labels';
import type { Evidence } from '../types';
import { EvidenceGallery } from './evidence-gallery';
import { EvidenceUploader } from './evidence-uploader';

interface Group {
  key: string;
  type: string;
  label: string;
  items: Evidence[];
}

/** The machine file's Evidence tab: attach to the machine itself, and see everything by record. */
export function MachineEvidence({ machineId }: { machineId: string }) {
  const me = useMe();
  const list = useMachineEvidence(machineId);
  const recorder = canRecord(me.data?.role);

  return (
    <Stack spacing={2}>
      {recorder && (
        <Paper component="section" aria-label="Attach to this machine" sx={{ p: 2 }}>
          <Typography variant="h3" component="h2" sx={{ mb: 0.5 }}>
            Attach to this machine
          </Typography>
          <Typography variant="body2" color="text.secondary" sx={{ mb: 1.5 }}>
            Photos of the frame, the set-up or the nameplate; drawings and datasheets as PDF; readings as CSV. Photos of
            a single check go on that check.
          </Typography>
          <EvidenceUploader subject={{ subjectType: 'machine', subjectId: machineId }} what="this machine" />
        </Paper>
      )}
      {list.isPending ? (
        <LoadingState label="Loading evidence…" />
      ) : list.isError ? (
        <ErrorState error={list.error} onRetry={() => list.refetch()} />
      ) : list.data.length === 0 ? (
        <EmptyState title="No evidence yet">
          {recorder
            ? 'Photos and files attached to this machine or any of its checks appear here.'
            : 'Nothing has been attached to this machine or its checks yet.'}
        </EmptyState>
      ) : (
        groups(list.data).map((g) => (
          <Paper component="section" key={g.key} aria-label={`Evidence: ${g.label}`} sx={{ p: 2 }}>
            <Box sx={{ display: 'flex', alignItems: 'center', gap: 1, mb: 1.5, flexWrap: 'wrap' }}>
              <Typography variant="h4" component="h3">
                {g.label}
              </Typography>
              <Chip size="small" variant="outlined" label={subjectTypeLabel(g.type)} />
              <Typography variant="body2" color="text.secondary">
                {count(g.items)}
              </Typography>
            </Box>
            <EvidenceGallery items={g.items} label={g.label} />
          </Paper>
        ))
      )}
    </Stack>
  );
}

/** The machine itself first, then each record in the order of its latest evidence. */
function groups(items: Evidence[]): Group[] {
  const map = new Map<string, Group>();
  for (const item of items) {
    const key = `${item.subject.type}:${item.subject.id}`;
    const group = map.get(key) ?? { key, type: item.subject.type, label: item.subject.label, items: [] };
    group.items.push(item);
    map.set(key, group);
  }
  return [...map.values()].sort((a, b) => Number(b.type === 'machine') - Number(a.type === 'machine'));
}

function count(items: Evidence[]): string {
  const photos = items.filter((i) => i.kind === 'photo').length;
  const files = items.length - photos;
  return [photos && `${photos} photo${photos === 1 ? '' : 's'}`, files && `${files} file${files === 1 ? '' : 's'}`]
    .filter(Boolean)
    .join(', ');
}
