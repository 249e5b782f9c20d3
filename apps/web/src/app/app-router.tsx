import { CATAPULT_ROLES } from '@catline/contracts';
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
      {
        path: '/forgot-password',
        lazy: async () => ({ Component: (await import('./routes/forgot-password.route.js')).ForgotPasswordRoute }),
      },
      {
        path: '/reset-password',
        lazy: async () => ({ Component: (await import('./routes/reset-password.route.js')).ResetPasswordRoute }),
      },
      {
        path: '/invitation',
        lazy: async () => ({ Component: (await import('./routes/invitation.route.js')).InvitationRoute }),
      },
      {
        element: <RequireSession />,
        children: [
          {
            element: <AppShell />,
            children: [
              { index: true, element: <Landing /> },
              {
                path: 'lineup',
                lazy: async () => ({
                  Component: (await import('../features/lineup/components/lineup-screen.js')).LineupScreen,
                }),
              },
              {
                path: 'deck',
                lazy: async () => ({
                  Component: (await import('../features/deck/components/deck-screen.js')).DeckScreen,
                }),
              },
              {
                element: <RoleRoute roles={CATAPULT_ROLES} screen="Cat station" />,
                children: [
                  {
                    path: 'cat-station',
                    lazy: async () => ({
                      Component: (await import('../features/cat-station/components/cat-station-screen.js'))
                        .CatStationScreen,
                    }),
                  },
                ],
              },
              {
                element: <RoleRoute roles={['pilot']} screen="My launch" />,
                children: [
                  {
                    path: 'my-launch',
                    lazy: async () => ({
                      Component: (await import('../features/my-launch/components/my-launch-screen.js')).MyLaunchScreen,
                    }),
                  },
                ],
              },
              {
                path: 'cycles',
                lazy: async () => ({
                  Component: (await import('../features/cycles/components/cycles-screen.js')).CyclesScreen,
                }),
              },
              {
                path: 'fleet',
                lazy: async () => ({
                  Component: (await import('../features/fleet/components/fleet-screen.js')).FleetScreen,
                }),
              },
              {
                path: 'launch-data',
                lazy: async () => ({
                  Component: (await import('../features/launch-data/components/launch-data-screen.js'))
                    .LaunchDataScreen,
                }),
              },
              {
                path: 'reports',
                lazy: async () => ({
                  Component: (await import('../features/reports/components/reports-screen.js')).ReportsScreen,
                }),
              },
              {
                path: 'reports/replay',
                lazy: async () => ({
                  Component: (await import('../features/reports/components/replay-screen.js')).ReplayScreen,
                }),
              },
              {
                path: 'reports/launch-sheet',
                lazy: async () => ({
                  Component: (await import('../features/reports/components/launch-sheet-screen.js')).LaunchSheetScreen,
                }),
              },
              {
                path: 'reports/shot-counts',
                lazy: async () => ({
                  Component: (await import('../features/reports/components/shot-counts-screen.js')).ShotCountsScreen,
                }),
              },
              {
                element: <RoleRoute roles={['admin']} screen="People" />,
                children: [
                  {
                    path: 'people',
                    lazy: async () => ({
                      Component: (await import('../features/people/components/people-screen.js')).PeopleScreen,
                    }),
                  },
                ],
              },
              {
                element: <RoleRoute roles={['admin']} screen="Audit" />,
                children: [
                  {
                    path: 'audit',
                    lazy: async () => ({
                      Component: (await import('../features/audit/components/audit-screen.js')).AuditScreen,
                    }),
                  },
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
