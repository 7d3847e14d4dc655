import { useDailyLogSync } from '../hooks/use-daily-log-sync';

/** Mounted once in the signed-in app: sends waiting logs in the background, whatever page is open. */
export function DailyLogSync({ userId }: { userId: string }) {
  useDailyLogSync(userId);
  return null;
}
