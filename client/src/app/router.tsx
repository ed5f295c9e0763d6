import { createBrowserRouter, RouterProvider } from 'react-router-dom';
import { RouteError } from '@/components/errors/route-error';
import { PageLoader } from '@/components/ui/page-loader';
import { paths } from '@/config/paths';
import { RedirectHome, RequireArea, RequireSession } from './guards';

// Each screen is its own chunk (route `lazy`), so signing in does not load the admin screens
// and a nurse's first page does not wait for the users table.
const router = createBrowserRouter([
  {
    path: paths.signIn.path,
    lazy: () => import('./routes/sign-in'),
    errorElement: <RouteError />,
    hydrateFallbackElement: <PageLoader />,
  },
  {
    path: paths.root.path,
    element: <RequireSession />,
    errorElement: <RouteError />,
    hydrateFallbackElement: <PageLoader />,
    children: [
      { index: true, element: <RedirectHome /> },
      {
        lazy: () => import('./routes/app-root'),
        children: [
          {
            element: <RequireArea area="clinical" />,
            children: [
              { path: paths.patients.path, lazy: () => import('./routes/patients') },
              { path: paths.patient.path, lazy: () => import('./routes/patient') },
            ],
          },
          {
            element: <RequireArea area="pharmacy" />,
            children: [{ path: paths.library.path, lazy: () => import('./routes/library') }],
          },
          {
            element: <RequireArea area="admin" />,
            children: [{ path: paths.adminUsers.path, lazy: () => import('./routes/admin-users') }],
          },
          { path: '*', lazy: () => import('./routes/not-found') },
        ],
      },
    ],
  },
]);

export function AppRouter() {
  return <RouterProvider router={router} />;
}
