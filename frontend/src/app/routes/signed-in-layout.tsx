import { Suspense, useEffect } from 'react';
import { registerOfflineApp } from '../register-offline-app';
import { Navigate, Outlet, useLocation } from 'react-router-dom';
import { Box } from '@mui/material';
import { useMe } from '../../lib/session/get-me';
import { AppFrame } from '../layout/app-frame';
import { LoadingState } from '../../components/states/loading-state';
import { ErrorState } from '../../components/states/error-state';
import { ErrorBoundary } from '../../components/states/error-boundary';
import { paths } from '../../config/paths';
import { WaitingEntriesBanner } from '../../components/offline/waiting-entries-banner';

/** Every signed-in page: sign-in first, then the frame around the page. */
export function SignedInLayout() {
  const me = useMe();
  const location = useLocation();
  const signedIn = !!me.data;
  useEffect(() => {
    if (signedIn) registerOfflineApp();
  }, [signedIn]);
  if (me.isPending) return <LoadingState label="Opening Railwright…" />;
  if (me.isError)
    return (
      <Box sx={{ p: 3 }}>
        <ErrorState error={me.error} onRetry={() => me.refetch()} />
      </Box>
    );
  if (!me.data)
    return <Navigate to={`${paths.signIn}?next=${encodeURIComponent(location.pathname + location.search)}`} replace />;
  return (
    <AppFrame user={me.data}>
      <WaitingEntriesBanner meId={me.data.id} />
      <ErrorBoundary key={location.pathname}>
        <Suspense fallback={<LoadingState />}>
          <Outlet />
        </Suspense>
      </ErrorBoundary>
    </AppFrame>
  );
}
