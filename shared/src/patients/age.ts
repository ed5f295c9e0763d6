/** Whole years between an ISO date of birth and a reference date (default now). */
export function ageInYears(dateOfBirth: string, at: Date = new Date()): number {
  const [year, month, day] = dateOfBirth.split('-').map(Number);
  let age = at.getUTCFullYear() - year;
  const beforeBirthday = at.getUTCMonth() + 1 < month || (at.getUTCMonth() + 1 === month && at.getUTCDate() < day);
  if (beforeBirthday) age -= 1;
  return age;
}

/** Whole months between an ISO date of birth and a reference date (default now). */
export function ageInMonths(dateOfBirth: string, at: Date = new Date()): number {
  const [year, month, day] = dateOfBirth.split('-').map(Number);
  let months = (at.getUTCFullYear() - year) * 12 + (at.getUTCMonth() + 1 - month);
  if (at.getUTCDate() < day) months -= 1;
  return months;
}
