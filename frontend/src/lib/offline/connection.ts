import { onlineManager } from '@tanstack/react-query';

const PROBE_EVERY_MS = 4000;
let probing: ReturnType<typeof setInterval> | null = null;

/**
 * The browser's own "online" flag says only that there is a network, not that the server can be
 * reached (workshop Wi-Fi up, the link to the server down), and a page opened from the service
 * worker without a connection may still claim to be online. So a request that gets no answer at
 * all marks the app offline (TanStack Query then pauses queries and entries instead of failing
 * them), and the server is asked every few seconds until it answers again.
 */
export function noteNoAnswer(): void {
  if (onlineManager.isOnline()) onlineManager.setOnline(false);
  if (probing) return;
  probing = setInterval(async () => {
    try {
      await fetch('/api/health', { cache: 'no-store' });
    } catch {
      return;
    }
    if (probing) clearInterval(probing);
    probing = null;
    onlineManager.setOnline(true);
  }, PROBE_EVERY_MS);
}
