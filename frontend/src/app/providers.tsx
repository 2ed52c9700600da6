import { useEffect, type ReactNode } from 'react';
import { CssBaseline, ThemeProvider } from '@mui/material';
import { useIsRestoring, type Query } from '@tanstack/react-query';
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

// Answers fetched since the app opened (the first page's requests start before the kept ones are
// read back) are current: only what was kept from an earlier visit is asked again.
const OPENED_AT = Date.now();
const keptFromEarlier = (q: Query) => q.state.dataUpdatedAt < OPENED_AT && q.state.fetchStatus === 'idle';

const dehydrateOptions: PersistQueryClientOptions['dehydrateOptions'] = {
  // Who is signed in and the machines' data are kept (lib/offline/kept-queries.ts), so
  // a page reloaded without a connection opens with what was last seen.
  shouldDehydrateQuery: isKeptQuery,
  // Every entry not yet recorded is kept, paused or waiting for its author to sign in.
  shouldDehydrateMutation: (m) => m.state.status === 'pending' && m.options.mutationKey?.[0] === COMMAND_KEY[0],
};

/**
 * Pages are drawn once what was kept is read back: the end of the reading re-renders everything
 * that uses data, so a page drawn meanwhile is drawn twice, and its first drawing is thrown away
 * unfinished.
 */
function WhenKeptAnswersRead({ children }: { children: ReactNode }) {
  return useIsRestoring() ? null : children;
}

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
        // session may have ended), unless asked already or under way; without a connection the
        // kept answers stay. Entries restored
        // from an earlier visit go out (each waits for its author).
        onSuccess={() => {
          void queryClient.invalidateQueries({ predicate: keptFromEarlier });
          resumeKeptCommands(queryClient);
        }}
      >
        <ErrorBoundary>
          <WhenKeptAnswersRead>{children}</WhenKeptAnswersRead>
        </ErrorBoundary>
      </PersistQueryClientProvider>
    </ThemeProvider>
  );
}
