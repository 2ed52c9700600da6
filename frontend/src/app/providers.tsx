import { useEffect, type ReactNode } from 'react';
import { CssBaseline, ThemeProvider } from '@mui/material';
import { PersistQueryClientProvider } from '@tanstack/react-query-persist-client';
import { queryClient } from '../lib/query-client';
import { persister, PERSIST_MAX_AGE_MS } from '../lib/offline/persister';
import { COMMAND_KEY, registerCommands, resumeKeptCommands } from '../lib/offline/commands';
import { trackSessionOwner } from '../lib/offline/track-session-owner';
import { followSessionEnd } from './session-end';
import { authKeys } from '../features/auth/api/get-me';
import { theme } from '../theme/theme';
import { ErrorBoundary } from '../components/states/error-boundary';

registerCommands(queryClient);

// Raised only when what is kept changes shape: a new value drops everything kept, waiting entries
// included, so it is not tied to each build (an update must not lose what was typed offline).
const KEPT_FORMAT = 'railwright-1';

export function AppProviders({ children }: { children: ReactNode }) {
  useEffect(() => {
    const stops = [trackSessionOwner(queryClient, authKeys.me), followSessionEnd(queryClient, authKeys.me)];
    return () => stops.forEach((stop) => stop());
  }, []);
  return (
    <ThemeProvider theme={theme}>
      <CssBaseline />
      <PersistQueryClientProvider
        client={queryClient}
        persistOptions={{
          persister,
          maxAge: PERSIST_MAX_AGE_MS,
          buster: KEPT_FORMAT,
          dehydrateOptions: {
            // Only who is signed in is kept of the answers (so the app and its waiting entries
            // open without a connection); everything else is asked afresh on every visit.
            shouldDehydrateQuery: (q) => q.state.status === 'success' && q.queryKey[0] === authKeys.me[0] && q.queryKey[1] === authKeys.me[1],
            // Every entry not yet recorded is kept, paused or waiting for its author to sign in.
            shouldDehydrateMutation: (m) => m.state.status === 'pending' && m.options.mutationKey?.[0] === COMMAND_KEY[0],
          },
        }}
        // Who is signed in is asked again at once (the session may have ended meanwhile); entries
        // restored from an earlier visit go out (each waits for its author).
        onSuccess={() => {
          void queryClient.invalidateQueries({ queryKey: authKeys.me });
          resumeKeptCommands(queryClient);
        }}
      >
        <ErrorBoundary>{children}</ErrorBoundary>
      </PersistQueryClientProvider>
    </ThemeProvider>
  );
}
