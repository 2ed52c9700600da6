import { useEffect, type ReactNode } from 'react';
import { CssBaseline, ThemeProvider } from '@mui/material';
import { PersistQueryClientProvider, type PersistQueryClientOptions } from '@tanstack/react-query-persist-client';
import { queryClient } from '../lib/query-client';
import { persister, PERSIST_MAX_AGE_MS } from '../lib/offline/persister';
import { COMMAND_KEY, registerCommands, resumeKeptCommands } from '../lib/offline/commands';
import { trackSessionOwner } from '../lib/offline/track-session-owner';
import { isKeptQuery } from '../lib/offline/kept-queries';
import { followSessionEnd } from './session-end';
import { authKeys } from '../lib/session/get-me';
import { theme } from '../theme/theme';
import { ErrorBoundary } from '../components/states/error-boundary';

registerCommands(queryClient);

// Raised only when what is kept changes shape: a new value drops everything kept, waiting entries
// included, so it is not tied to each build (an update must not lose what was typed offline).
const KEPT_FORMAT = 'railwright-1';

const dehydrateOptions: PersistQueryClientOptions['dehydrateOptions'] = {
  // Who is signed in and the machines' data are kept (lib/offline/kept-queries.ts), so
  // a page reloaded without a connection opens with what was last seen.
  shouldDehydrateQuery: isKeptQuery,
  // Every entry not yet recorded is kept, paused or waiting for its author to sign in.
  shouldDehydrateMutation: (m) => m.state.status === 'pending' && m.options.mutationKey?.[0] === COMMAND_KEY[0],
};

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
          dehydrateOptions,
        }}
        // What was kept shows at once and is all asked again (others record meanwhile, the
        // session may have ended); without a connection the kept answers stay. Entries restored
        // from an earlier visit go out (each waits for its author).
        onSuccess={() => {
          void queryClient.invalidateQueries();
          resumeKeptCommands(queryClient);
        }}
      >
        <ErrorBoundary>{children}</ErrorBoundary>
      </PersistQueryClientProvider>
    </ThemeProvider>
  );
}
