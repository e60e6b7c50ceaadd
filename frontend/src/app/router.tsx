import { createBrowserRouter, type RouteObject } from 'react-router';
import { FullPageLoading } from '../components/ui';
import { RouteErrorBoundary } from './routes/route-error';
import { RootLayout } from './routes/root-layout';

/** Every page is its own chunk; the shell, guards and error page load with the app. */
export const routes: RouteObject[] = [
  {
    id: 'root',
    Component: RootLayout,
    errorElement: <RouteErrorBoundary />,
    HydrateFallback: () => <FullPageLoading />,
    children: [
      { path: 'sign-in', lazy: () => import('./routes/sign-in').then((m) => ({ Component: m.SignInRoute })) },
      {
        path: 'forgot-password',
        lazy: () => import('./routes/forgot-password').then((m) => ({ Component: m.ForgotPasswordRoute })),
      },
      {
        path: 'reset-password',
        lazy: () => import('./routes/reset-password').then((m) => ({ Component: m.ResetPasswordRoute })),
      },
      {
        path: 'accept-invitation',
        lazy: () => import('./routes/accept-invitation').then((m) => ({ Component: m.AcceptInvitationRoute })),
      },
      {
        lazy: () => import('./routes/protected-layout').then((m) => ({ Component: m.ProtectedLayout })),
        children: [
          { index: true, lazy: () => import('./routes/home').then((m) => ({ Component: m.HomeRoute })) },
          { path: 'parts', lazy: () => import('./routes/parts-catalog').then((m) => ({ Component: m.PartsCatalogRoute })) },
          {
            path: 'parts/import',
            lazy: () => import('./routes/parts-import').then((m) => ({ Component: m.PartsImportRoute })),
          },
          { path: 'parts/new', lazy: () => import('./routes/part-new').then((m) => ({ Component: m.PartNewRoute })) },
          { path: 'parts/:id', lazy: () => import('./routes/part-detail').then((m) => ({ Component: m.PartDetailRoute })) },
          { path: 'parts/:id/edit', lazy: () => import('./routes/part-edit').then((m) => ({ Component: m.PartEditRoute })) },
          {
            path: 'parts/:id/alternates',
            lazy: () => import('./routes/part-alternates').then((m) => ({ Component: m.PartAlternatesRoute })),
          },
          { path: 'positions', lazy: () => import('./routes/positions').then((m) => ({ Component: m.PositionsRoute })) },
          { path: 'positions/:id', lazy: () => import('./routes/positions').then((m) => ({ Component: m.PositionsRoute })) },
          {
            path: 'datasheets',
            lazy: () => import('./routes/datasheets').then((m) => ({ Component: m.DatasheetsRoute })),
          },
          {
            path: 'datasheets/:id',
            lazy: () => import('./routes/datasheet-review').then((m) => ({ Component: m.DatasheetReviewRoute })),
          },
          { path: 'compare', lazy: () => import('./routes/compare').then((m) => ({ Component: m.CompareRoute })) },
          { path: 'boms', lazy: () => import('./routes/boms').then((m) => ({ Component: m.BomsRoute })) },
          { path: 'boms/new', lazy: () => import('./routes/boms-new').then((m) => ({ Component: m.BomsNewRoute })) },
          { path: 'boms/:id', lazy: () => import('./routes/boms-detail').then((m) => ({ Component: m.BomsDetailRoute })) },
          {
            path: 'boms/:id/report',
            lazy: () => import('./routes/boms-report').then((m) => ({ Component: m.BomsReportRoute })),
          },
          { path: 'notices', lazy: () => import('./routes/notices').then((m) => ({ Component: m.NoticesRoute })) },
          {
            path: 'settings/alerts',
            lazy: () => import('./routes/settings-alerts').then((m) => ({ Component: m.SettingsAlertsRoute })),
          },
          {
            path: 'admin/people',
            lazy: () => import('./routes/admin-people').then((m) => ({ Component: m.AdminPeopleRoute })),
          },
          {
            path: 'admin/outbox',
            lazy: () => import('./routes/admin-outbox').then((m) => ({ Component: m.AdminOutboxRoute })),
          },
        ],
      },
      { path: '*', lazy: () => import('./routes/not-found').then((m) => ({ Component: m.NotFoundRoute })) },
    ],
  },
];

export function createAppRouter() {
  return createBrowserRouter(routes);
}
