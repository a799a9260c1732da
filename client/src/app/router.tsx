import type { QueryClient } from '@tanstack/react-query';
import type { ComponentType } from 'react';
import type { LoaderFunction, LoaderFunctionArgs, RouteObject } from 'react-router';
import type { Role } from '@yardcall/shared';
import { loadWords, type WordPart } from '@/lib/i18n/load-words';
import { SignInRoute } from '@/features/auth/routes/sign-in';
import { AppShell } from './layout/app-shell';
import { RootError, RouteError, RouteLoading } from './layout/route-status';
import { NotFound } from './layout/not-found';
import type { ShellHandle } from './layout/shell-handle';
import { redirectToRoleHome, requireRole } from './guards';

interface ScreenModule {
  Component: ComponentType;
  loader?: LoaderFunction;
}

// The root loads the core words (the shell's and the sign-in's among them); every screen loads
// its part with its code.
const DRIVER_WORDS: WordPart[] = ['driver'];
// The finish screen signs with the same words as the next driver's review (the driver's part).
const FINISH_WORDS: WordPart[] = ['driver', 'finish'];
// Office screens name units, kinds and statuses too (the driver's part) and show reports (the finish
// part); only the driver's first load is kept small.
const OFFICE_WORDS: WordPart[] = ['driver', 'finish', 'screens'];

// A screen behind the role check, in its own chunk. Its data is fetched only once the check
// passes, so a signed-out visitor or another role never fires the screen's calls.
function guardedScreen(
  queryClient: QueryClient,
  path: string,
  roles: readonly Role[],
  load: () => Promise<ScreenModule>,
  handle?: ShellHandle,
  words: WordPart[] = OFFICE_WORDS,
): RouteObject {
  const guard = requireRole(queryClient, roles);
  return {
    path,
    handle,
    loader: async (args: LoaderFunctionArgs) => {
      const redirect = await guard(args);
      if (redirect) return redirect;
      const [screen] = await Promise.all([load(), loadWords(...words)]);
      return screen.loader ? screen.loader(args) : null;
    },
    lazy: async () => ({ Component: (await load()).Component }),
  };
}

function publicScreen(path: string, load: () => Promise<ComponentType>, words: WordPart[] = []): RouteObject {
  return {
    path,
    lazy: async () => {
      const [Component] = await Promise.all([load(), loadWords(...words)]);
      return { Component };
    },
  };
}

// Every screen is its own chunk: a driver's first load carries no admin or supervisor code.
export function createAppRoutes(queryClient: QueryClient): RouteObject[] {
  const screen = (path: string, roles: readonly Role[], load: () => Promise<ScreenModule>, handle?: ShellHandle) =>
    guardedScreen(queryClient, path, roles, load, handle);
  const driverScreen = (
    path: string,
    load: () => Promise<ScreenModule>,
    handle?: ShellHandle,
    words: WordPart[] = DRIVER_WORDS,
  ) => guardedScreen(queryClient, path, ['driver'], load, handle, words);
  return [
    {
      path: '/',
      // The core words in the driver's language (English ones come with the page).
      loader: async () => {
        await loadWords('core');
        return null;
      },
      Component: AppShell,
      ErrorBoundary: RootError,
      HydrateFallback: RouteLoading,
      children: [
        {
          // Errors below the shell keep the header, so settings and sign-out stay in reach.
          ErrorBoundary: RouteError,
          children: [
            { index: true, loader: redirectToRoleHome(queryClient) },
            // With the page itself, not a chunk of its own: a cold first visit paints it without a
            // second round trip.
            { path: 'sign-in', Component: SignInRoute },
            publicScreen(
              'invite/:token',
              async () => (await import('@/features/auth/routes/accept-invitation')).AcceptInvitationRoute,
              OFFICE_WORDS,
            ),
            publicScreen(
              'settings',
              async () => (await import('@/features/settings/routes/settings')).SettingsRoute,
              OFFICE_WORDS,
            ),

            driverScreen('driver', async () => ({
              Component: (await import('./routes/driver-home')).DriverHomeRoute,
            })),
            driverScreen('driver/start', async () => {
              const route = await import('./routes/start-inspection');
              return { Component: route.StartInspectionRoute, loader: route.startInspectionLoader(queryClient) };
            }),
            driverScreen(
              'driver/inspections/:clientId',
              async () => ({
                Component: (await import('@/features/walkaround/routes/run-inspection')).RunInspectionRoute,
              }),
              { focused: true },
            ),
            driverScreen(
              'driver/inspections/:clientId/finish',
              async () => ({
                Component: (await import('@/features/walkaround/routes/finish-inspection')).FinishInspectionRoute,
              }),
              undefined,
              FINISH_WORDS,
            ),
            screen('mechanic', ['mechanic'], async () => {
              const route = await import('./routes/mechanic-home');
              return { Component: route.MechanicHomeRoute, loader: route.mechanicHomeLoader(queryClient) };
            }),
            screen('supervisor', ['supervisor'], async () => {
              const route = await import('./routes/supervisor-home');
              return { Component: route.SupervisorHomeRoute, loader: route.supervisorHomeLoader(queryClient) };
            }),
            screen('supervisor/inspections', ['supervisor', 'admin'], async () => {
              const route = await import('@/features/inspections/routes/inspections');
              return { Component: route.InspectionsRoute, loader: route.inspectionsLoader(queryClient) };
            }),
            screen('supervisor/inspections/:inspectionId', ['supervisor', 'admin'], async () => {
              const route = await import('@/features/inspections/routes/inspection-detail');
              return { Component: route.InspectionDetailRoute, loader: route.inspectionDetailLoader(queryClient) };
            }),
            screen('trainer', ['trainer'], async () => {
              const route = await import('./routes/trainer-home');
              return { Component: route.TrainerHomeRoute, loader: route.trainerHomeLoader(queryClient) };
            }),
            screen('trainer/attempts/:attemptId', ['trainer'], async () => {
              const route = await import('@/features/training/routes/review-attempt');
              return { Component: route.ReviewAttemptRoute, loader: route.reviewAttemptLoader(queryClient) };
            }),
            screen('training/practice', ['driver'], async () => {
              const route = await import('@/features/training/routes/practice');
              return { Component: route.PracticeRoute, loader: route.practiceLoader(queryClient) };
            }),
            screen('training/feedback', ['driver'], async () => {
              const route = await import('@/features/training/routes/feedback');
              return { Component: route.FeedbackRoute, loader: route.feedbackLoader(queryClient) };
            }),
            screen('training/feedback/:attemptId', ['driver'], async () => {
              const route = await import('@/features/training/routes/feedback-attempt');
              return { Component: route.FeedbackAttemptRoute, loader: route.feedbackAttemptLoader(queryClient) };
            }),
            screen('vehicles', ['admin', 'supervisor', 'mechanic'], async () => {
              const route = await import('@/features/vehicles/routes/vehicles');
              return { Component: route.VehiclesRoute, loader: route.vehiclesLoader(queryClient) };
            }),
            screen('vehicles/new', ['admin'], async () => ({
              Component: (await import('@/features/vehicles/routes/vehicle-new')).VehicleNewRoute,
            })),
            screen('vehicles/:vehicleId', ['admin'], async () => {
              const route = await import('@/features/vehicles/routes/vehicle-edit');
              return { Component: route.VehicleEditRoute, loader: route.vehicleEditLoader(queryClient) };
            }),
            screen('admin', ['admin'], async () => ({
              Component: (await import('@/features/home/routes/admin-home')).AdminHome,
            })),
            screen('admin/users', ['admin'], async () => {
              const route = await import('@/features/users/routes/users');
              return { Component: route.UsersRoute, loader: route.usersLoader(queryClient) };
            }),
            screen('admin/retention', ['admin'], async () => {
              const route = await import('@/features/organization/routes/retention');
              return { Component: route.RetentionRoute, loader: route.retentionLoader(queryClient) };
            }),
            screen('admin/time-zone', ['admin'], async () => {
              const route = await import('@/features/organization/routes/time-zone');
              return { Component: route.TimeZoneRoute, loader: route.timeZoneLoader(queryClient) };
            }),
            screen('admin/readings', ['admin'], async () => {
              const route = await import('@/features/organization/routes/required-readings');
              return { Component: route.RequiredReadingsRoute, loader: route.requiredReadingsLoader(queryClient) };
            }),
            screen('admin/outbox', ['admin'], async () => {
              const route = await import('@/features/users/routes/outbox');
              return { Component: route.OutboxRoute, loader: route.outboxLoader(queryClient) };
            }),
            { path: '*', Component: NotFound },
          ],
        },
      ],
    },
  ];
}
