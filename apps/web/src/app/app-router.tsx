import { createBrowserRouter, Navigate, RouterProvider } from 'react-router-dom';
import { LoadingState } from '../components/query-states.js';
import { useSessionUser } from '../lib/session-store.js';
import { AppShell } from './app-shell.js';
import { landingPath } from './landing.js';
import { RequireSession } from './require-session.js';
import { RoleRoute } from './role-route.js';
import { RouteError } from './route-error.js';

function Landing() {
  return <Navigate to={landingPath(useSessionUser().role)} replace />;
}

const router = createBrowserRouter([
  {
    errorElement: <RouteError />,
    HydrateFallback: () => <LoadingState label="Opening Catline…" />,
    children: [
      { path: '/sign-in', lazy: async () => ({ Component: (await import('./routes/sign-in.route.js')).SignInRoute }) },
      { path: '/forgot-password', lazy: async () => ({ Component: (await import('./routes/forgot-password.route.js')).ForgotPasswordRoute }) },
      { path: '/reset-password', lazy: async () => ({ Component: (await import('./routes/reset-password.route.js')).ResetPasswordRoute }) },
      { path: '/invitation', lazy: async () => ({ Component: (await import('./routes/invitation.route.js')).InvitationRoute }) },
      {
        element: <RequireSession />,
        children: [
          {
            element: <AppShell />,
            children: [
              { index: true, element: <Landing /> },
              { path: 'lineup', lazy: async () => ({ Component: (await import('./routes/lineup.route.js')).LineupRoute }) },
              {
                element: <RoleRoute roles={['catapult_officer']} screen="Cat station" />,
                children: [
                  { path: 'cat-station', lazy: async () => ({ Component: (await import('./routes/cat-station.route.js')).CatStationRoute }) },
                ],
              },
              {
                element: <RoleRoute roles={['pilot']} screen="My launch" />,
                children: [
                  { path: 'my-launch', lazy: async () => ({ Component: (await import('./routes/my-launch.route.js')).MyLaunchRoute }) },
                ],
              },
              { path: 'cycles', lazy: async () => ({ Component: (await import('./routes/cycles.route.js')).CyclesRoute }) },
              { path: 'fleet', lazy: async () => ({ Component: (await import('./routes/fleet.route.js')).FleetRoute }) },
              { path: 'launch-data', lazy: async () => ({ Component: (await import('./routes/launch-data.route.js')).LaunchDataRoute }) },
              { path: 'reports', lazy: async () => ({ Component: (await import('./routes/reports.route.js')).ReportsRoute }) },
              { path: 'reports/replay', lazy: async () => ({ Component: (await import('./routes/replay.route.js')).ReplayRoute }) },
              { path: 'reports/launch-sheet', lazy: async () => ({ Component: (await import('./routes/launch-sheet.route.js')).LaunchSheetRoute }) },
              { path: 'reports/shot-counts', lazy: async () => ({ Component: (await import('./routes/shot-counts.route.js')).ShotCountsRoute }) },
              {
                element: <RoleRoute roles={['admin']} screen="People" />,
                children: [
                  { path: 'people', lazy: async () => ({ Component: (await import('./routes/people.route.js')).PeopleRoute }) },
                ],
              },
              { path: '*', element: <NotFound /> },
            ],
          },
        ],
      },
    ],
  },
]);

function NotFound() {
  return <Navigate to="/" replace />;
}

export function AppRouter() {
  return <RouterProvider router={router} />;
}
