import { useState } from 'react';
import {
  Accordion,
  Alert,
  AccordionDetails,
  AccordionSummary,
  Box,
  Chip,
  Link,
  Stack,
  Typography,
} from '@mui/material';
import ExpandMoreIcon from '@mui/icons-material/ExpandMore';
import AttachFileOutlined from '@mui/icons-material/AttachFileOutlined';
import { LoadingState } from '../../../components/states/loading-state';
import { ErrorState } from '../../../components/states/error-state';
import { EmptyState } from '../../../components/states/empty-state';
import { useOutbox } from '../api/get-outbox';
import { attachmentUrl } from '../types';
import { formatDateTime } from '../../../lib/format-time';

// Links inside a message, made clickable so a set-your-password link can be followed here.
const URL_RE = /(https?:\/\/[^\s]+)/g;

function Body({ text }: { text: string }) {
  return (
    <Typography component="pre" sx={{ whiteSpace: 'pre-wrap', fontFamily: 'inherit', m: 0, wordBreak: 'break-word' }}>
      {text.split(URL_RE).map((part, i) =>
        /^https?:\/\//.test(part) ? (
          <Link key={i} href={part}>
            {part}
          </Link>
        ) : (
          part
        ),
      )}
    </Typography>
  );
}

/** What the local fake mail server caught for this workshop, newest first. */
export function OutboxList() {
  const outbox = useOutbox();
  const [open, setOpen] = useState<string | false>(false);
  if (outbox.isPending) return <LoadingState label="Reading the outbox…" />;
  if (outbox.isError) return <ErrorState error={outbox.error} onRetry={() => outbox.refetch()} />;
  if (!outbox.data.length)
    return (
      <EmptyState title="No messages yet">
        Mail the product sends (invitations, approval requests, approvals, re-checks) appears here.
      </EmptyState>
    );
  return (
    <Box>
      {outbox.data.map((m) => (
        <Accordion key={m.id} expanded={open === m.id} onChange={(_, e) => setOpen(e ? m.id : false)} disableGutters>
          <AccordionSummary expandIcon={<ExpandMoreIcon />}>
            <Stack sx={{ minWidth: 0 }}>
              <Typography sx={{ fontWeight: 600 }}>{m.subject}</Typography>
              <Typography variant="body2" color="text.secondary" noWrap>
                to {m.to.join(', ')} · {formatDateTime(m.receivedAt)}
                {m.attachments.length > 0 &&
                  ` · ${m.attachments.length} attachment${m.attachments.length > 1 ? 's' : ''}`}
              </Typography>
            </Stack>
          </AccordionSummary>
          <AccordionDetails>
            <Typography variant="caption" color="text.secondary" component="p" sx={{ mb: 1 }}>
              From {m.from}
            </Typography>
            {m.linkHidden && (
              <Alert severity="info" sx={{ mb: 1 }}>
                Sent to {m.to.join(', ')}, link hidden: a password link is for its recipient alone.
              </Alert>
            )}
            <Body text={m.text} />
            {m.attachments.map((a) => (
              <Chip
                key={a.index}
                icon={<AttachFileOutlined />}
                label={`${a.filename} (${Math.ceil(a.sizeBytes / 1024)} kB)`}
                component="a"
                href={attachmentUrl(m.id, a.index)}
                clickable
                sx={{ mt: 1, mr: 1 }}
              />
            ))}
          </AccordionDetails>
        </Accordion>
      ))}
    </Box>
  );
}
