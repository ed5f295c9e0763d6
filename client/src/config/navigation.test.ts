import { describe, expect, it } from 'vitest';
import { ROLES, type Role } from '@lockstep/shared';
import { canAccess, homePathFor, landingPathFor, navItemsFor } from './navigation';
import { isSafeRedirect, paths } from './paths';

const NAV_LABELS: Partial<Record<Role, string[]>> = { admin: ['Users'], pharmacist: ['Patients', 'Library'] };

describe('role homes and navigation', () => {
  it('lands clinical roles on Patients and the admin on Users', () => {
    expect(homePathFor('prescriber')).toBe('/patients');
    expect(homePathFor('pharmacist')).toBe('/patients');
    expect(homePathFor('nurse')).toBe('/patients');
    expect(homePathFor('charge_nurse')).toBe('/patients');
    expect(homePathFor('admin')).toBe('/admin/users');
  });

  it("shows each role only its own screens", () => {
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

  it("sends the role home otherwise", () => {
    expect(landingPathFor('nurse', '/admin/users')).toBe('/patients');
    expect(landingPathFor('admin', '/patients/3')).toBe('/admin/users');
    expect(landingPathFor('nurse', null)).toBe('/patients');
    expect(landingPathFor('nurse', '/patientsXYZ')).toBe('/patients');
    expect(landingPathFor('nurse', '/library')).toBe('/patients');
    expect(landingPathFor('nurse', '//elsewhere.example/patients')).toBe('/patients');
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
