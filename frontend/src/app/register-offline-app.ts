let registered = false;

/**
 * Registers the service worker that lets the app open without a connection (vite.config.ts); a
 * new build replaces it on the next visit. Called once someone is signed in, and loaded on demand,
 * so the sign-in page stays light (it is of no use offline: signing in needs the server).
 */
export function registerOfflineApp(): void {
  if (registered || !('serviceWorker' in navigator)) return;
  registered = true;
  void import('virtual:pwa-register').then(({ registerSW }) => registerSW({ immediate: true }));
}
