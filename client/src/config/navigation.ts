import {
  AUDIT_ROLES,
  BEDSIDE_ROLES,
  CLINICAL_ROLES,
  PHARMACY_ROLES,
  PRESCRIBING_ROLES,
  WARD_POLICY_APPROVER_ROLES,
  type Role,
} from '@lockstep/shared';
import { isSafeRedirect, paths } from './paths';

/** Groups of screens; each route is guarded by one of these. */
export type Area = 'clinical' | 'prescribing' | 'bedside' | 'pharmacy' | 'policySignOff' | 'admin' | 'audit';

// The same role groups the server's @Roles use (shared), so a screen shows exactly what the API allows.
export const AREA_ROLES: Record<Area, readonly Role[]> = {
  clinical: CLINICAL_ROLES,
  prescribing: PRESCRIBING_ROLES,
  bedside: BEDSIDE_ROLES,
  pharmacy: PHARMACY_ROLES,
  // Charge nurses and pharmacists give a ward policy change its clinical second signature.
  policySignOff: WARD_POLICY_APPROVER_ROLES,
  admin: ['admin'],
  // The server narrows what a pharmacist may read to orders and library versions.
  audit: AUDIT_ROLES,
};

export type NavIcon =
  'patients' | 'library' | 'equianalgesic' | 'users' | 'orders' | 'verification' | 'mailbox' | 'bedside' | 'handover' | 'policy' | 'audit';

export interface NavItem {
  label: string;
  href: string;
  icon: NavIcon;
  area: Area;
}

// In the order they appear in the left navigation. Only screens that exist are listed.
const NAV_ITEMS: readonly NavItem[] = [
  { label: 'Patients', href: paths.patients.getHref(), icon: 'patients', area: 'clinical' },
  { label: 'My orders', href: paths.myOrders.getHref(), icon: 'orders', area: 'prescribing' },
  { label: 'PCA orders', href: paths.bedside.getHref(), icon: 'bedside', area: 'bedside' },
  { label: 'Observations due', href: paths.observationsDue.getHref(), icon: 'bedside', area: 'bedside' },
  // Listed for nurses and charge nurses; prescribers and pharmacists may still open it (clinical area).
  { label: 'Handover', href: paths.handover.getHref(), icon: 'handover', area: 'bedside' },
  { label: 'Verification', href: paths.verificationQueue.getHref(), icon: 'verification', area: 'pharmacy' },
  { label: 'Library', href: paths.library.getHref(), icon: 'library', area: 'pharmacy' },
  // Listed for pharmacists, who edit it; every clinical role may open it (the usage page links to it).
  { label: 'Equianalgesic factors', href: paths.equianalgesicFactors.getHref(), icon: 'equianalgesic', area: 'pharmacy' },
  { label: 'Ward policy sign-off', href: paths.wardPolicySignOff.getHref(), icon: 'policy', area: 'policySignOff' },
  { label: 'Users', href: paths.adminUsers.getHref(), icon: 'users', area: 'admin' },
  { label: 'Ward policies', href: paths.adminWardPolicies.getHref(), icon: 'policy', area: 'admin' },
  { label: 'Mailbox', href: paths.adminMailbox.getHref(), icon: 'mailbox', area: 'admin' },
  { label: 'Audit', href: paths.adminAudit.getHref(), icon: 'audit', area: 'audit' },
];

export function canAccess(role: Role, area: Area): boolean {
  return AREA_ROLES[area].includes(role);
}

export function navItemsFor(role: Role): NavItem[] {
  return NAV_ITEMS.filter((item) => canAccess(role, item.area));
}

// Each role starts where its work waits: the prescriber's own orders (returned ones first), the
// pharmacist's verification queue, the nurse's PCA orders (bedside checks and observations due),
// the charge nurse's handover board.
const HOMES: Record<Role, string> = {
  prescriber: paths.myOrders.getHref(),
  pharmacist: paths.verificationQueue.getHref(),
  nurse: paths.bedside.getHref(),
  charge_nurse: paths.handover.getHref(),
  admin: paths.adminUsers.getHref(),
};

/** Where a role lands after signing in, and where it is sent from a screen not its own. */
export function homePathFor(role: Role): string {
  return HOMES[role];
}

const ROUTE_AREAS: ReadonlyArray<{ prefix: string; area: Area }> = [
  { prefix: paths.patients.path, area: 'clinical' },
  { prefix: paths.library.path, area: 'pharmacy' },
  { prefix: paths.equianalgesicFactors.path, area: 'clinical' },
  { prefix: paths.myOrders.path, area: 'prescribing' },
  { prefix: '/orders', area: 'clinical' },
  { prefix: paths.verificationQueue.path, area: 'pharmacy' },
  { prefix: '/releases', area: 'pharmacy' },
  { prefix: paths.bedside.path, area: 'bedside' },
  { prefix: paths.handover.path, area: 'clinical' },
  { prefix: '/pca', area: 'clinical' },
  { prefix: paths.wardPolicySignOff.path, area: 'policySignOff' },
  { prefix: paths.adminAudit.path, area: 'audit' },
  { prefix: '/admin', area: 'admin' },
];

/**
 * After sign-in: the page asked for, when this role may see it; otherwise the role's home.
 * (A nurse signing in on a screen left open by an admin lands on Patients, not Users.)
 */
export function landingPathFor(role: Role, requested: string | null): string {
  if (!isSafeRedirect(requested)) return homePathFor(role);
  const pathname = requested.split(/[?#]/)[0];
  const match = ROUTE_AREAS.find(({ prefix }) => pathname === prefix || pathname.startsWith(`${prefix}/`));
  return match && canAccess(role, match.area) ? requested : homePathFor(role);
}
