import { ROLES, type Role } from '@pondwright/shared';

/** Which roles may open each area of the app. The server enforces the same rules. */
export const AREA_ROLES = {
  home: ROLES,
  team: ['owner'],
  company: ['owner'],
  takeoff: ['owner', 'estimator'],
  priceBook: ['owner', 'estimator'],
  /** Changing prices, the policy and the book's CSV; estimators read the book. */
  priceBookEdit: ['owner'],
  /** The crews' production rates learned from closed jobs; putting one in the book is the owner's. */
  learnedRates: ['owner', 'estimator'],
  learnedRatesAdopt: ['owner'],
  pricedTakeoffs: ['owner', 'estimator'],
  estimates: ['owner', 'estimator'],
  /** Crew leads read customers and sites for the job packet's access notes. */
  customers: ROLES,
  customersEdit: ['owner', 'estimator'],
  /** The approval queue and the pipeline dashboard on Home. */
  approvals: ['owner'],
  dashboard: ['owner'],
  /** Jobs, the schedule and crews: everyone reads them; crew leads mostly keep the daily logs. */
  jobs: ROLES,
  /** A job's budget money and cost report; crew leads see quantities only. */
  jobsMoney: ['owner', 'estimator'],
  /** Giving a job a date and crew, or moving it. */
  jobsSchedule: ['owner', 'estimator'],
  /** Closing a completed job, after which it takes no more logs. */
  jobsClose: ['owner'],
  crewsEdit: ['owner'],
  /** The developer mailbox; the server also hides it (404) in production. */
  devMailbox: ['owner'],
} as const satisfies Record<string, readonly Role[]>;

export type Area = keyof typeof AREA_ROLES;

export function canAccess(role: Role, area: Area): boolean {
  return (AREA_ROLES[area] as readonly Role[]).includes(role);
}
