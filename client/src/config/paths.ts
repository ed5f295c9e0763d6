/** Every route of the client, with the builder for its href. Nothing else spells a path. */
export const paths = {
  root: {
    path: '/',
    getHref: () => '/',
  },
  signIn: {
    path: '/sign-in',
    /** `redirectTo` is where to go after signing in (only paths inside the app are kept). */
    getHref: (redirectTo?: string) =>
      redirectTo && isSafeRedirect(redirectTo) && redirectTo !== '/' ? `/sign-in?redirectTo=${encodeURIComponent(redirectTo)}` : '/sign-in',
  },
  patients: {
    path: '/patients',
    getHref: () => '/patients',
  },
  patient: {
    path: '/patients/:patientId',
    getHref: (patientId: number) => `/patients/${patientId}`,
  },
  library: {
    path: '/library',
    /** `ward` and `version` pick what the screen shows, so a reload keeps them. */
    getHref: (selection: { wardId?: number; versionId?: number } = {}) => {
      const query = new URLSearchParams();
      if (selection.wardId !== undefined) query.set('ward', String(selection.wardId));
      if (selection.versionId !== undefined) query.set('version', String(selection.versionId));
      const search = query.toString();
      return search ? `/library?${search}` : '/library';
    },
  },
  equianalgesicFactors: {
    path: '/equianalgesic-factors',
    getHref: () => '/equianalgesic-factors',
  },
  adminUsers: {
    path: '/admin/users',
    getHref: () => '/admin/users',
  },
  newOrder: {
    path: '/patients/:patientId/orders/new',
    getHref: (patientId: number) => `/patients/${patientId}/orders/new`,
  },
  myOrders: {
    path: '/orders/mine',
    getHref: () => '/orders/mine',
  },
  order: {
    path: '/orders/:orderId',
    getHref: (orderId: number) => `/orders/${orderId}`,
  },
  reviseOrder: {
    path: '/orders/:orderId/revise',
    getHref: (orderId: number) => `/orders/${orderId}/revise`,
  },
  verificationQueue: {
    path: '/verification',
    /** `ward` filters the queue, so a reload keeps it. */
    getHref: (wardId?: number) => (wardId === undefined ? '/verification' : `/verification?ward=${wardId}`),
  },
  verification: {
    path: '/verification/:orderId',
    getHref: (orderId: number) => `/verification/${orderId}`,
  },
  releaseLabel: {
    path: '/releases/:orderId/:releaseId/label',
    getHref: (orderId: number, releaseId: number) => `/releases/${orderId}/${releaseId}/label`,
  },
  adminMailbox: {
    path: '/admin/mailbox',
    getHref: () => '/admin/mailbox',
  },
  bedside: {
    path: '/bedside',
    /** The nurse's PCA orders; `ward` and `patient` narrow the list, so a reload keeps them. */
    getHref: (selection: { wardId?: number; patientId?: number } = {}) => {
      const query = new URLSearchParams();
      if (selection.wardId !== undefined) query.set('ward', String(selection.wardId));
      if (selection.patientId !== undefined) query.set('patient', String(selection.patientId));
      const search = query.toString();
      return search ? `/bedside?${search}` : '/bedside';
    },
  },
  observationsDue: {
    path: '/bedside/due',
    /** The ward's running PCAs by when their next observation is due. */
    getHref: () => '/bedside/due',
  },
  bedsideCheck: {
    path: '/bedside/:orderId/check',
    getHref: (orderId: number) => `/bedside/${orderId}/check`,
  },
  bedsideBolus: {
    path: '/bedside/:orderId/bolus',
    getHref: (orderId: number) => `/bedside/${orderId}/bolus`,
  },
  bedsideSyringeChange: {
    path: '/bedside/:orderId/syringe-change',
    getHref: (orderId: number) => `/bedside/${orderId}/syringe-change`,
  },
  bedsideDiscontinue: {
    path: '/bedside/:orderId/discontinue',
    getHref: (orderId: number) => `/bedside/${orderId}/discontinue`,
  },
  bedsideResume: {
    path: '/bedside/:orderId/resume',
    getHref: (orderId: number) => `/bedside/${orderId}/resume`,
  },
  handover: {
    path: '/handover',
    /** `ward` picks the board, so a reload keeps it. */
    getHref: (wardId?: number) => (wardId === undefined ? '/handover' : `/handover?ward=${wardId}`),
  },
  handoverPrint: {
    path: '/handover/print',
    getHref: (wardId: number) => `/handover/print?ward=${wardId}`,
  },
  pca: {
    path: '/pca/:orderId',
    /** One patient's PCA: flags, usage and charts; `hours` is the chart window (default 12). */
    getHref: (orderId: number, hours?: number) => (hours === undefined ? `/pca/${orderId}` : `/pca/${orderId}?hours=${hours}`),
  },
  pcaObserve: {
    path: '/pca/:orderId/observe',
    getHref: (orderId: number) => `/pca/${orderId}/observe`,
  },
  adminAudit: {
    path: '/admin/audit',
    /** The filters and the page live in the address, so a reload or a shared link keeps them. */
    getHref: (search: Readonly<Record<string, string | number | undefined>> = {}) => {
      const query = new URLSearchParams();
      for (const [key, value] of Object.entries(search)) {
        if (value !== undefined && value !== '') query.set(key, String(value));
      }
      const text = query.toString();
      return text ? `/admin/audit?${text}` : '/admin/audit';
    },
  },
  wardPolicySignOff: {
    path: '/ward-policies/sign-off',
    /** Ward policy changes waiting for a charge nurse's or pharmacist's signature. */
    getHref: () => '/ward-policies/sign-off',
  },
  adminWardPolicies: {
    path: '/admin/ward-policies',
    /** `ward` picks the ward, so a reload keeps it. */
    getHref: (wardId?: number) => (wardId === undefined ? '/admin/ward-policies' : `/admin/ward-policies?ward=${wardId}`),
  },
} as const;

/**
 * Only a path on this site may be a redirect target: '/patients' yes; '//elsewhere.example',
 * 'https://…' or '/\\elsewhere' no (browsers read those as other hosts).
 */
export function isSafeRedirect(target: string | null | undefined): target is string {
  if (!target) return false;
  return target.startsWith('/') && !target.startsWith('//') && !target.startsWith('/\\');
}
