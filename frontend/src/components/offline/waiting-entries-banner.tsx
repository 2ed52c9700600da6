import { Alert, AlertTitle, Box, Button, Collapse } from '@mui/material';
import { useMutationState, useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { COMMAND_KEY, type CommandVariables } from '../../lib/offline/commands';
import { useOnline } from './use-online';

const entries = (n: number) => `${n} ${n === 1 ? 'entry' : 'entries'}`;

/**
 * Above every page: the connection is lost, and how many entries wait on this device to be sent;
 * entries someone else typed here wait for them to sign in; an entry the server refused later is
 * shown with its reason, so nothing typed is lost without a word.
 */
export function WaitingEntriesBanner({ meId }: { meId: string | null }) {
  const online = useOnline();
  const client = useQueryClient();
  const [open, setOpen] = useState(false);
  const waiting = useMutationState({
    filters: { mutationKey: COMMAND_KEY, status: 'pending' },
    select: (m) => m.state.variables as CommandVariables,
  });
  const refused = useMutationState({
    filters: { mutationKey: COMMAND_KEY, status: 'error' },
    select: (m) => ({
      id: m.mutationId,
      v: m.state.variables as CommandVariables,
      message: (m.state.error as Error | null)?.message ?? '',
    }),
  });
  const mine = waiting.filter((v) => v.ownerId === meId);
  const others = waiting.filter((v) => v.ownerId !== meId);
  const dismiss = (id: number) => {
    const m = client
      .getMutationCache()
      .getAll()
      .find((x) => x.mutationId === id);
    if (m) client.getMutationCache().remove(m);
  };
  if (online && !waiting.length && !refused.length) return null;
  return (
    <Box sx={{ px: { xs: 1, sm: 2 }, pt: 1 }} aria-live="polite">
      {(!online || mine.length > 0) && (
        <Alert
          severity={online ? 'info' : 'warning'}
          role="status"
          action={
            mine.length > 0 && (
              <Button color="inherit" size="small" onClick={() => setOpen((o) => !o)} sx={{ minHeight: 44 }}>
                {open ? 'Hide' : 'Show'}
              </Button>
            )
          }
        >
          <AlertTitle>
            {online
              ? `Sending ${entries(mine.length)}…`
              : mine.length
                ? `Offline: ${entries(mine.length)} waiting on this device`
                : 'Offline'}
          </AlertTitle>
          {online
            ? 'They go out in the order they were typed.'
            : 'Keep recording: entries are kept on this device and sent once, in order, when the connection returns. Do not clear the browser’s data.'}
          <Collapse in={open}>
            <Box component="ul" sx={{ m: 0, mt: 1, pl: 2.5 }}>
              {mine.map((v) => (
                <li key={v.key}>{v.label}</li>
              ))}
            </Box>
          </Collapse>
        </Alert>
      )}
      {others.length > 0 && (
        <Alert severity="info" sx={{ mt: 1 }}>
          {entries(others.length)} typed on this device by {[...new Set(others.map((v) => v.ownerName))].join(', ')}{' '}
          {others.length === 1
            ? 'waits until its author signs in here again; it is never sent'
            : 'wait until their authors sign in here again; they are never sent'}{' '}
          under another person’s sign-in.
        </Alert>
      )}
      {refused.map((r) => (
        <Alert key={r.id} severity="error" sx={{ mt: 1 }} onClose={() => dismiss(r.id)}>
          <AlertTitle>An entry sent later was refused</AlertTitle>
          {r.v.label}: {r.message}
        </Alert>
      ))}
    </Box>
  );
}
