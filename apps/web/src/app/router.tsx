import { useMemo } from 'react';
import { createBrowserRouter, redirect, RouterProvider, type RouteObject } from 'react-router-dom';
import { RouteError } from '@/components/errors/route-error';
import { PageLoader } from '@/components/layout/page-loader';
import { paths } from '@/config/paths';

// Every page is its own chunk: the first paint carries the shell, not the admin screens or,
// later, the editor and KaTeX.
export const routes: RouteObject[] = [
  {
    path: paths.auth.signIn.path,
    lazy: () => import('./routes/auth/sign-in').then((m) => ({ Component: m.SignInRoute })),
    ErrorBoundary: RouteError,
    HydrateFallback: PageLoader,
  },
  {
    path: paths.auth.forgotPassword.path,
    lazy: () => import('./routes/auth/forgot-password').then((m) => ({ Component: m.ForgotPasswordRoute })),
    ErrorBoundary: RouteError,
    HydrateFallback: PageLoader,
  },
  {
    path: paths.auth.resetPassword.path,
    lazy: () => import('./routes/auth/reset-password').then((m) => ({ Component: m.ResetPasswordRoute })),
    ErrorBoundary: RouteError,
    HydrateFallback: PageLoader,
  },
  {
    path: paths.auth.acceptInvite.path,
    lazy: () => import('./routes/auth/accept-invite').then((m) => ({ Component: m.AcceptInviteRoute })),
    ErrorBoundary: RouteError,
    HydrateFallback: PageLoader,
  },
  {
    path: paths.root.path,
    lazy: () => import('./routes/app/root').then((m) => ({ Component: m.AppRoot })),
    ErrorBoundary: RouteError,
    HydrateFallback: PageLoader,
    children: [
      { index: true, loader: () => redirect(paths.library.home.getHref()) },
      {
        path: paths.library.home.path,
        lazy: () => import('./routes/app/library').then((m) => ({ Component: m.LibraryRoute })),
        ErrorBoundary: RouteError,
      },
      {
        path: paths.library.collection.path,
        lazy: () => import('./routes/app/collection').then((m) => ({ Component: m.CollectionRoute })),
        ErrorBoundary: RouteError,
      },
      {
        path: paths.search.path,
        lazy: () => import('./routes/app/search').then((m) => ({ Component: m.SearchRoute })),
        ErrorBoundary: RouteError,
      },
      {
        path: paths.standards.page.path,
        lazy: () => import('./routes/app/standard').then((m) => ({ Component: m.StandardRoute })),
        ErrorBoundary: RouteError,
      },
      {
        path: paths.standards.create.path,
        lazy: () => import('./routes/app/standards/new').then((m) => ({ Component: m.NewStandardRoute })),
        ErrorBoundary: RouteError,
      },
      {
        path: paths.standards.edit.path,
        lazy: () => import('./routes/app/standards/edit').then((m) => ({ Component: m.EditStandardRoute })),
        ErrorBoundary: RouteError,
      },
      {
        path: paths.standards.history.path,
        lazy: () => import('./routes/app/standards/history').then((m) => ({ Component: m.StandardHistoryRoute })),
        ErrorBoundary: RouteError,
      },
      {
        path: paths.standards.compare.path,
        lazy: () => import('./routes/app/standards/compare').then((m) => ({ Component: m.StandardCompareRoute })),
        ErrorBoundary: RouteError,
      },
      {
        path: paths.records.list.path,
        lazy: () => import('./routes/app/records/list').then((m) => ({ Component: m.RecordsRoute })),
        ErrorBoundary: RouteError,
      },
      {
        path: paths.records.record.path,
        lazy: () => import('./routes/app/records/record').then((m) => ({ Component: m.RecordRoute })),
        ErrorBoundary: RouteError,
      },
      {
        path: paths.methods.catalog.path,
        lazy: () => import('./routes/app/methods/catalog').then((m) => ({ Component: m.MethodsCatalogRoute })),
        ErrorBoundary: RouteError,
      },
      {
        path: paths.methods.create.path,
        lazy: () => import('./routes/app/methods/new').then((m) => ({ Component: m.NewMethodRoute })),
        ErrorBoundary: RouteError,
      },
      {
        path: paths.methods.method.path,
        lazy: () => import('./routes/app/methods/method').then((m) => ({ Component: m.MethodRoute })),
        ErrorBoundary: RouteError,
      },
      {
        path: paths.methods.design.path,
        lazy: () => import('./routes/app/methods/design').then((m) => ({ Component: m.MethodDesignRoute })),
        ErrorBoundary: RouteError,
      },
      {
        path: paths.methods.review.path,
        lazy: () => import('./routes/app/methods/review').then((m) => ({ Component: m.MethodReviewRoute })),
        ErrorBoundary: RouteError,
      },
      {
        path: paths.methods.compare.path,
        lazy: () => import('./routes/app/methods/compare').then((m) => ({ Component: m.MethodCompareRoute })),
        ErrorBoundary: RouteError,
      },
      {
        path: paths.admin.root.path,
        lazy: () => import('./routes/app/admin/root').then((m) => ({ Component: m.AdminRoot })),
        ErrorBoundary: RouteError,
        children: [
          { index: true, loader: () => redirect(paths.admin.users.getHref()) },
          {
            path: paths.admin.users.path,
            lazy: () => import('./routes/app/admin/users').then((m) => ({ Component: m.UsersRoute })),
            ErrorBoundary: RouteError,
          },
          {
            path: paths.admin.mail.path,
            lazy: () => import('./routes/app/admin/mail').then((m) => ({ Component: m.MailRoute })),
            ErrorBoundary: RouteError,
          },
          {
            path: paths.admin.audit.path,
            lazy: () => import('./routes/app/admin/audit').then((m) => ({ Component: m.AuditRoute })),
            ErrorBoundary: RouteError,
          },
        ],
      },
    ],
  },
  {
    path: '*',
    lazy: () => import('./routes/not-found').then((m) => ({ Component: m.NotFoundRoute })),
    ErrorBoundary: RouteError,
    HydrateFallback: PageLoader,
  },
];

export function AppRouter() {
  const router = useMemo(() => createBrowserRouter(routes), []);
  return <RouterProvider router={router} />;
}
