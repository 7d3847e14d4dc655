/**
 * The last day of work that starts on `start` (YYYY-MM-DD) and takes `crewDays` working days, Monday
 * to Friday, part days counting as a whole one; a weekend start is moved to the Monday first. Crews
 * working Saturdays is a company rule this does not know yet. // common practice, no source
 */
export function plannedEnd(start: string, crewDays: number): string {
  const day = new Date(`${start}T00:00:00Z`);
  const skipWeekend = () => {
    while (day.getUTCDay() === 0 || day.getUTCDay() === 6) day.setUTCDate(day.getUTCDate() + 1);
  };
  skipWeekend();
  for (let left = Math.max(1, Math.ceil(crewDays)) - 1; left > 0; left--) {
    day.setUTCDate(day.getUTCDate() + 1);
    skipWeekend();
  }
  return day.toISOString().slice(0, 10);
}
