import { Box, Paper, Typography } from '@mui/material';
import { useMe } from '../../../lib/session/get-me';
import { canRecord } from '../../../lib/session/roles';
import { useSubjectEvidence } from '../api/get-subject-evidence';
import { LoadingState } from '../../../components/states/loading-state';
import { ErrorState } from '../../../components/states/error-state';
import { EvidenceGallery } from './evidence-gallery';
import { EvidenceUploader } from './evidence-uploader';

interface Props {
  subjectType: string;
  subjectId: string;
  title?: string;
  /** What the files are attached to, in words ("rail Y1"), for the drop zone's label. */
  what?: string;
}

/** Photos and files of one record, to embed beside a check: upload (if allowed) and gallery. */
export function EvidencePanel({ subjectType, subjectId, title = 'Photos and files', what }: Props) {
  const me = useMe();
  const list = useSubjectEvidence(subjectType, subjectId);
  const subject = { subjectType, subjectId };
  return (
    <Paper component="section" aria-label={title} sx={{ p: 2 }}>
      <Typography variant="h3" component="h2" sx={{ mb: 1.5 }}>
        {title}
      </Typography>
      {canRecord(me.data?.role) && (
        <Box sx={{ mb: 2 }}>
          <Box data-print="hide">
            <EvidenceUploader subject={subject} what={what} />
          </Box>
        </Box>
      )}
      {list.isPending ? (
        <LoadingState label="Loading photos and files…" />
      ) : list.isError ? (
        <ErrorState error={list.error} onRetry={() => list.refetch()} />
      ) : list.data.length ? (
        <EvidenceGallery items={list.data} label={title} />
      ) : (
        <Typography color="text.secondary">Nothing attached yet.</Typography>
      )}
    </Paper>
  );
}
