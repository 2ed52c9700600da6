import { queryClient } from '../../lib/query-client';
import { startEarlyRequests } from './early-requests';

// Imported by main.tsx ahead of the router, which starts loading the page's code as soon as it is
// made: these requests are queued first, so the browser's few connections to the server take
// them before the page's code files.
startEarlyRequests(queryClient, window.location);
