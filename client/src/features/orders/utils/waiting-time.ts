const MINUTE_MS = 60_000;

/** Whole minutes from `since` to `now`, never negative (a clock a little ahead reads 0). */
export function waitingMinutes(since: string, now: Date): number {
  const start = new Date(since).getTime();
  if (Number.isNaN(start)) return 0;
  return Math.max(0, Math.floor((now.getTime() - start) / MINUTE_MS));
}

/** "42 min", "3 h 5 min", "2 d 4 h": how long an order has waited, short enough for a queue. */
export function formatWaitingTime(since: string, now: Date): string {
  const minutes = waitingMinutes(since, now);
  if (minutes === 0) return 'under 1 min';
  if (minutes < 60) return `${minutes} min`;
  const hours = Math.floor(minutes / 60);
  if (hours < 24) {
    const rest = minutes % 60;
    return rest === 0 ? `${hours} h` : `${hours} h ${rest} min`;
  }
  const days = Math.floor(hours / 24);
  const restHours = hours % 24;
  return restHours === 0 ? `${days} d` : `${days} d ${restHours} h`;
}
