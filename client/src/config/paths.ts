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
      redirectTo && isSafeRedirect(redirectTo) && redirectTo !== '/'
        ? `/sign-in?redirectTo=${encodeURIComponent(redirectTo)}`
        : '/sign-in',
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
  adminUsers: {
    path: '/admin/users',
    getHref: () => '/admin/users',
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
