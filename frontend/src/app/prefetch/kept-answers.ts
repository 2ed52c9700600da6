import type { Persister } from '@tanstack/react-query-persist-client';
import { persister } from '../../lib/offline/persister';

let reading: ReturnType<Persister['restoreClient']> | undefined;

/**
 * Start reading back what the device kept (IndexedDB) as the app opens. The query provider asks
 * for it only after its first render, and its answer re-renders every page using data: read
 * early, it is there before the page's code is, so the page is drawn once and not drawn again
 * halfway through.
 */
export function startReadingKeptAnswers() {
  reading ??= persister.restoreClient();
}

/** The app's persister, handing out the read started early the first time it is asked. */
export const keptAnswersPersister: Persister = {
  persistClient: (client) => persister.persistClient(client),
  removeClient: () => persister.removeClient(),
  restoreClient: () => {
    const started = reading;
    reading = undefined;
    return started ?? persister.restoreClient();
  },
};
