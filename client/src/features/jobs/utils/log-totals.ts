import type { DailyLogView } from '@pondwright/shared';

/**
 * Hours logged in a day, for display. Each entry has at most two decimals, so the sum is made in
 * hundredths of an hour, as whole numbers, and never picks up binary rounding noise.
 */
export function hoursLogged(log: Pick<DailyLogView, 'entries'>): string {
  let hundredths = 0;
  for (const entry of log.entries) {
    if (entry.kind === 'hours') hundredths += Math.round(Number(entry.hours) * 100);
  }
  const whole = Math.trunc(hundredths / 100);
  const rest = hundredths % 100;
  if (rest === 0) return String(whole);
  return `${whole}.${String(rest).padStart(2, '0').replace(/0$/, '')}`;
}
