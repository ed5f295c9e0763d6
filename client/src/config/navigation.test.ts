import { describe, expect, it } from 'vitest';
import { ROLES, type Role } from '@lockstep/shared';
import { canAccess, homePathFor, landingPathFor, navItemsFor } from './navigation';
import { isSafeRedirect, paths } from './paths';

const NAV_LABELS: Partial<Record<Role, string[]>> = {
  admin: ['Users', 'Ward policies', 'Mailbox', 'Audit'],
  pharmacist: ['Patients', 'Verification', 'Library', 'Equianalgesic factors', 'Ward policy sign-off', 'Audit'],
  prescriber: ['Patients', 'My orders'],
  nurse: ['Patients', 'PCA orders', 'Observations due', 'Handover'],
  charge_nurse: ['Patients', 'PCA orders', 'Observations due', 'Handover', 'Ward policy sign-off'],
};

describe('role homes and navigation', () => {
  it('lands each role where its work waits', () => {
    expect(homePathFor('prescriber')).toBe('/orders/mine');
    expect(homePathFor('pharmacist')).toBe('/verification');
    expect(homePathFor('nurse')).toBe('/bedside');
    expect(homePathFor('charge_nurse')).toBe('/handover');
    expect(homePathFor('admin')).toBe('/admin/users');
  });

  it('shows each role only its own screens', () => {
    for (const role of ROLES) {
      const labels = navItemsFor(role).map((item) => item.label);
      expect(labels).toEqual(NAV_LABELS[role] ?? ['Patients']);
    }
  });

  it("every role's home is a screen it may open", () => {
    for (const role of ROLES) {
      expect(navItemsFor(role).map((item) => item.href)).toContain(homePathFor(role));
    }
  });

  it('keeps areas apart', () => {
    expect(canAccess('nurse', 'admin')).toBe(false);
    expect(canAccess('admin', 'clinical')).toBe(false);
    expect(canAccess('charge_nurse', 'clinical')).toBe(true);
    expect(canAccess('pharmacist', 'pharmacy')).toBe(true);
    expect(canAccess('prescriber', 'pharmacy')).toBe(false);
    expect(canAccess('admin', 'pharmacy')).toBe(false);
  });
});

describe('landingPathFor', () => {
  it('returns to the requested page when the role may see it', () => {
    expect(landingPathFor('nurse', '/patients/12')).toBe('/patients/12');
    expect(landingPathFor('admin', '/admin/users')).toBe('/admin/users');
    expect(landingPathFor('nurse', '/patients?ward=2')).toBe('/patients?ward=2');
    expect(landingPathFor('pharmacist', '/library?ward=2&version=5')).toBe('/library?ward=2&version=5');
  });

  it('sends the role home otherwise', () => {
    expect(landingPathFor('nurse', '/admin/users')).toBe('/bedside');
    expect(landingPathFor('admin', '/patients/3')).toBe('/admin/users');
    expect(landingPathFor('nurse', null)).toBe('/bedside');
    expect(landingPathFor('nurse', '/patientsXYZ')).toBe('/bedside');
    expect(landingPathFor('nurse', '/library')).toBe('/bedside');
    expect(landingPathFor('nurse', '//elsewhere.example/patients')).toBe('/bedside');
  });
});

describe('paths', () => {
  it('builds hrefs', () => {
    expect(paths.patient.getHref(7)).toBe('/patients/7');
    expect(paths.signIn.getHref('/patients/7')).toBe('/sign-in?redirectTo=%2Fpatients%2F7');
    expect(paths.signIn.getHref('https://elsewhere.example')).toBe('/sign-in');
    expect(paths.signIn.getHref()).toBe('/sign-in');
    expect(paths.library.getHref()).toBe('/library');
    expect(paths.library.getHref({ wardId: 2, versionId: 9 })).toBe('/library?ward=2&version=9');
  });

  it('accepts only same-site redirect targets', () => {
    expect(isSafeRedirect('/patients')).toBe(true);
    expect(isSafeRedirect('//evil.example')).toBe(false);
    expect(isSafeRedirect('/\\evil.example')).toBe(false);
    expect(isSafeRedirect('https://evil.example')).toBe(false);
    expect(isSafeRedirect(null)).toBe(false);
  });
});

describe('order, verification and mailbox routes', () => {
  it('builds their hrefs', () => {
    expect(paths.newOrder.getHref(1)).toBe('/patients/1/orders/new');
    expect(paths.order.getHref(14)).toBe('/orders/14');
    expect(paths.reviseOrder.getHref(14)).toBe('/orders/14/revise');
    expect(paths.verificationQueue.getHref()).toBe('/verification');
    expect(paths.verificationQueue.getHref(2)).toBe('/verification?ward=2');
    expect(paths.releaseLabel.getHref(14, 3)).toBe('/releases/14/3/label');
  });

  it('lands each role only on order screens it may open', () => {
    expect(landingPathFor('prescriber', '/orders/mine')).toBe('/orders/mine');
    expect(landingPathFor('nurse', '/orders/mine')).toBe(homePathFor('nurse'));
    expect(landingPathFor('nurse', '/orders/14')).toBe('/orders/14');
    expect(landingPathFor('pharmacist', '/verification/14')).toBe('/verification/14');
    expect(landingPathFor('prescriber', '/verification/14')).toBe(homePathFor('prescriber'));
    expect(landingPathFor('pharmacist', '/releases/14/3/label')).toBe('/releases/14/3/label');
    expect(landingPathFor('admin', '/admin/mailbox')).toBe('/admin/mailbox');
    expect(landingPathFor('admin', '/orders/14')).toBe('/admin/users');
  });
});

describe('bedside routes', () => {
  it('builds their hrefs', () => {
    expect(paths.bedside.getHref()).toBe('/bedside');
    expect(paths.bedside.getHref({ wardId: 2 })).toBe('/bedside?ward=2');
    expect(paths.bedside.getHref({ wardId: 2, patientId: 5 })).toBe('/bedside?ward=2&patient=5');
    expect(paths.bedsideCheck.getHref(14)).toBe('/bedside/14/check');
    expect(paths.bedsideBolus.getHref(14)).toBe('/bedside/14/bolus');
    expect(paths.bedsideSyringeChange.getHref(14)).toBe('/bedside/14/syringe-change');
    expect(paths.bedsideDiscontinue.getHref(14)).toBe('/bedside/14/discontinue');
  });

  it('are for nurses and charge nurses only', () => {
    expect(canAccess('nurse', 'bedside')).toBe(true);
    expect(canAccess('charge_nurse', 'bedside')).toBe(true);
    expect(canAccess('prescriber', 'bedside')).toBe(false);
    expect(canAccess('pharmacist', 'bedside')).toBe(false);
    expect(landingPathFor('nurse', '/bedside/14/check')).toBe('/bedside/14/check');
    expect(landingPathFor('charge_nurse', '/bedside?ward=2')).toBe('/bedside?ward=2');
    expect(landingPathFor('pharmacist', '/bedside/14/check')).toBe(homePathFor('pharmacist'));
  });
});

describe('handover routes', () => {
  it('builds their hrefs', () => {
    expect(paths.handover.getHref()).toBe('/handover');
    expect(paths.handover.getHref(1)).toBe('/handover?ward=1');
    expect(paths.handoverPrint.getHref(1)).toBe('/handover/print?ward=1');
  });

  it('are read by every clinical role; the admin goes home', () => {
    expect(landingPathFor('charge_nurse', '/handover?ward=1')).toBe('/handover?ward=1');
    expect(landingPathFor('nurse', '/handover/print?ward=1')).toBe('/handover/print?ward=1');
    expect(landingPathFor('prescriber', '/handover?ward=1')).toBe('/handover?ward=1');
    expect(landingPathFor('admin', '/handover')).toBe('/admin/users');
  });
});

describe('PCA and ward policy routes', () => {
  it('builds their hrefs', () => {
    expect(paths.pca.getHref(14)).toBe('/pca/14');
    expect(paths.pca.getHref(14, 8)).toBe('/pca/14?hours=8');
    expect(paths.pcaObserve.getHref(14)).toBe('/pca/14/observe');
    expect(paths.adminWardPolicies.getHref()).toBe('/admin/ward-policies');
    expect(paths.adminWardPolicies.getHref(2)).toBe('/admin/ward-policies?ward=2');
  });

  it('opens the PCA page to every clinical role and the ward policies to the admin only', () => {
    expect(landingPathFor('prescriber', '/pca/14?hours=8')).toBe('/pca/14?hours=8');
    expect(landingPathFor('nurse', '/pca/14/observe')).toBe('/pca/14/observe');
    expect(landingPathFor('admin', '/pca/14')).toBe('/admin/users');
    expect(landingPathFor('admin', '/admin/ward-policies?ward=2')).toBe('/admin/ward-policies?ward=2');
    expect(landingPathFor('charge_nurse', '/admin/ward-policies')).toBe(homePathFor('charge_nurse'));
  });
});

describe('ward policy sign-off route', () => {
  it('builds its href', () => {
    expect(paths.wardPolicySignOff.getHref()).toBe('/ward-policies/sign-off');
  });

  it('is open to charge nurses and pharmacists, who sign changes off, and to nobody else (the admin proposes)', () => {
    expect(landingPathFor('charge_nurse', '/ward-policies/sign-off')).toBe('/ward-policies/sign-off');
    expect(landingPathFor('pharmacist', '/ward-policies/sign-off')).toBe('/ward-policies/sign-off');
    expect(landingPathFor('admin', '/ward-policies/sign-off')).toBe(homePathFor('admin'));
    expect(landingPathFor('nurse', '/ward-policies/sign-off')).toBe(homePathFor('nurse'));
    expect(landingPathFor('prescriber', '/ward-policies/sign-off')).toBe(homePathFor('prescriber'));
  });
});

describe('audit route', () => {
  it('builds its href from the filters, leaving out empty ones', () => {
    expect(paths.adminAudit.getHref()).toBe('/admin/audit');
    expect(paths.adminAudit.getHref({ entityType: 'order', entityId: '14', action: '', page: 2, userId: undefined })).toBe(
      '/admin/audit?entityType=order&entityId=14&page=2',
    );
  });

  it('is open to the admin and to pharmacists, and to nobody else', () => {
    expect(landingPathFor('admin', '/admin/audit?entityType=ward')).toBe('/admin/audit?entityType=ward');
    expect(landingPathFor('pharmacist', '/admin/audit')).toBe('/admin/audit');
    expect(landingPathFor('pharmacist', '/admin/users')).toBe(homePathFor('pharmacist'));
    expect(landingPathFor('nurse', '/admin/audit')).toBe(homePathFor('nurse'));
    expect(landingPathFor('prescriber', '/admin/audit')).toBe(homePathFor('prescriber'));
  });
});
