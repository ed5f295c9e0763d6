// The demo's sign-ins as the seed writes them (server/src/database/seed). Plain data, so any test
// can use them without loading the app.

/** Every demo account's password. */
export const DEMO_PASSWORD = 'lockstep-demo';

/** Demo accounts by role, one each (README, "Demo accounts"; docs/design.md, "Roles and screens"). */
export const DEMO_USER_BY_ROLE = {
  prescriber: 'amara.osei',
  pharmacist: 'lin.park',
  nurse: 'kai.mendes',
  charge_nurse: 'mei.tan',
  admin: 'sam.rivera',
} as const;
