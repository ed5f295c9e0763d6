/** A span of minutes as "45 min", "2 h" or "3 h 10 min" (rounded; hours never turn into days). */
export function formatMinutes(totalMinutes: number): string {
  const minutes = Math.max(0, Math.round(totalMinutes));
  const hours = Math.floor(minutes / 60);
  const rest = minutes % 60;
  if (hours === 0) return `${rest} min`;
  return rest === 0 ? `${hours} h` : `${hours} h ${rest} min`;
}

/** "45 min", "3 h 5 min", "2 d 4 h": how long ago something started, short enough for a column. */
export function formatElapsed(minutes: number): string {
  const whole = Math.max(0, Math.floor(minutes));
  if (whole === 0) return 'under 1 min';
  const hours = Math.floor(whole / 60);
  if (hours < 24) return formatMinutes(whole);
  const days = Math.floor(hours / 24);
  const restHours = hours % 24;
  return restHours === 0 ? `${days} d` : `${days} d ${restHours} h`;
}
