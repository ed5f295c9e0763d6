/**
 * A `datetime` column as a Date, from a raw query (no entity). TypeORM stores UTC text such as
 * "2026-01-02 03:04:05.678" on SQLite; PostgreSQL's driver already answers a Date.
 */
export function storedDate(value: string | Date): Date {
  if (value instanceof Date) return value;
  const iso = value.replace(' ', 'T');
  return new Date(/(Z|[+-]\d\d:?\d\d)$/.test(iso) ? iso : `${iso}Z`);
}
