import { formatNearTime, minutesUntil } from '@/utils/clock';
import { formatMinutes } from '@/utils/duration';

/** "About 18:40" and "In 3 h 10 min", or why there is no projection yet. */
export function describeProjectedEmpty(projectedEmptyAt: string | null, now: Date, timeZone?: string): { value: string; detail: string } {
  if (!projectedEmptyAt) return { value: 'Not projected yet', detail: 'Needs an observation of the running syringe' };
  const minutes = minutesUntil(projectedEmptyAt, now);
  const value = `About ${formatNearTime(projectedEmptyAt, now, timeZone)}`;
  return { value, detail: minutes <= 0 ? 'Already passed: check the syringe' : `In ${formatMinutes(minutes)}` };
}
