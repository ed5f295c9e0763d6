import type { Role } from '@lockstep/shared';

/** Every demo account shares this password. Demo only: the sign-in page shows it in demo mode. */
export const DEMO_PASSWORD = 'lockstep-demo';

export interface DemoStaffMember {
  username: string;
  displayName: string;
  role: Role;
  wardCodes: string[];
}

export const DEMO_STAFF: DemoStaffMember[] = [
  { username: 'amara.osei', displayName: 'Dr Amara Osei', role: 'prescriber', wardCodes: ['HAR', 'CED', 'WRE', 'SUM'] },
  { username: 'lin.park', displayName: 'Lin Park', role: 'pharmacist', wardCodes: ['HAR', 'CED', 'WRE', 'SUM'] },
  { username: 'tomas.ortiz', displayName: 'Tomas Ortiz', role: 'pharmacist', wardCodes: ['HAR', 'CED', 'WRE', 'SUM'] },
  { username: 'kai.mendes', displayName: 'Kai Mendes', role: 'nurse', wardCodes: ['HAR', 'SUM'] },
  { username: 'rosa.adeyemi', displayName: 'Rosa Adeyemi', role: 'nurse', wardCodes: ['HAR', 'CED'] },
  { username: 'mei.tan', displayName: 'Mei Tan', role: 'charge_nurse', wardCodes: ['HAR'] },
  { username: 'sam.rivera', displayName: 'Sam Rivera', role: 'admin', wardCodes: [] },
];

export const DEMO_ACCOUNTS = DEMO_STAFF.map(({ username, displayName, role }) => ({ username, displayName, role }));
