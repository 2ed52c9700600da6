import { createBrowserRouter, Navigate, RouterProvider } from 'react-router-dom';
import { paths } from '../config/paths';
import { SignInRoute } from './routes/sign-in';
import { NotFoundRoute } from './routes/not-found';

// Pages load on demand so the sign-in screen stays light; the signed-in frame (navigation,
// drawer, tooltips) too, as the sign-in page never shows it.
const page = (load: () => Promise<{ default: React.ComponentType }>) => async () => ({
  Component: (await load()).default,
});

const router = createBrowserRouter([
  { path: paths.signIn, Component: SignInRoute },
  { path: paths.setPassword, lazy: page(() => import('./routes/set-password')) },
  { path: paths.forgotPassword, lazy: page(() => import('./routes/forgot-password')) },
  { path: '/verify/:token', lazy: page(() => import('./routes/verify')) },
  {
    lazy: async () => ({ Component: (await import('./routes/signed-in-layout')).SignedInLayout }),
    children: [
      { index: true, element: <Navigate to={paths.machines} replace /> },
      { path: paths.people, lazy: page(() => import('./routes/people')) },
      { path: paths.machines, lazy: page(() => import('./routes/machines')) },
      { path: '/machines/:machineId', lazy: page(() => import('./routes/machine-file')) },
      // Feature routes: one line each.
      { path: paths.targetSets, lazy: page(() => import('./routes/target-sets')) },
      { path: '/machines/:machineId/rails/:railId', lazy: page(() => import('./routes/rail')) },
      { path: paths.calculators, lazy: page(() => import('./routes/calculators')) },
      { path: '/machines/:machineId/rails/:railId/bolt-down', lazy: page(() => import('./routes/bolt-down')) },
      { path: '/machines/:machineId/axes/:axisId', lazy: page(() => import('./routes/axis')) },
      { path: paths.outbox, lazy: page(() => import('./routes/outbox')) },
      { path: paths.activity, lazy: page(() => import('./routes/activity')) },
      { path: '/machines/:machineId/templates/:patternId', lazy: page(() => import('./routes/hole-pattern')) },
      { path: '*', Component: NotFoundRoute },
    ],
  },
]);

export function AppRouter() {
  return <RouterProvider router={router} />;
}
