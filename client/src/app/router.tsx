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
              { path: paths.order.path, lazy: () => import('./routes/order') },
              { path: paths.handover.path, lazy: () => import('./routes/handover') },
              { path: paths.handoverPrint.path, lazy: () => import('./routes/handover-print') },
              { path: paths.pca.path, lazy: () => import('./routes/pca') },
              { path: paths.equianalgesicFactors.path, lazy: () => import('./routes/equianalgesic-factors') },
            ],
          },
          {
            element: <RequireArea area="prescribing" />,
            children: [
              { path: paths.newOrder.path, lazy: () => import('./routes/order-form') },
              { path: paths.reviseOrder.path, lazy: () => import('./routes/order-form') },
              { path: paths.myOrders.path, lazy: () => import('./routes/my-orders') },
            ],
          },
          {
            element: <RequireArea area="bedside" />,
            children: [
              { path: paths.bedside.path, lazy: () => import('./routes/bedside') },
              { path: paths.observationsDue.path, lazy: () => import('./routes/observations-due') },
              { path: paths.bedsideCheck.path, lazy: () => import('./routes/bedside-check') },
              { path: paths.bedsideBolus.path, lazy: () => import('./routes/bedside-bolus') },
              { path: paths.bedsideSyringeChange.path, lazy: () => import('./routes/bedside-syringe-change') },
              { path: paths.bedsideDiscontinue.path, lazy: () => import('./routes/bedside-discontinue') },
              { path: paths.bedsideResume.path, lazy: () => import('./routes/bedside-resume') },
              { path: paths.pcaObserve.path, lazy: () => import('./routes/pca-observe') },
            ],
          },
          {
            element: <RequireArea area="pharmacy" />,
            children: [
              { path: paths.library.path, lazy: () => import('./routes/library') },
              { path: paths.verificationQueue.path, lazy: () => import('./routes/verification-queue') },
              { path: paths.verification.path, lazy: () => import('./routes/verification') },
              { path: paths.releaseLabel.path, lazy: () => import('./routes/release-label') },
            ],
          },
          {
            element: <RequireArea area="policySignOff" />,
            children: [{ path: paths.wardPolicySignOff.path, lazy: () => import('./routes/ward-policy-sign-off') }],
          },
          {
            element: <RequireArea area="admin" />,
            children: [
              { path: paths.adminUsers.path, lazy: () => import('./routes/admin-users') },
              { path: paths.adminWardPolicies.path, lazy: () => import('./routes/admin-ward-policies') },
              { path: paths.adminMailbox.path, lazy: () => import('./routes/admin-mailbox') },
            ],
          },
          {
            element: <RequireArea area="audit" />,
            children: [{ path: paths.adminAudit.path, lazy: () => import('./routes/admin-audit') }],
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
