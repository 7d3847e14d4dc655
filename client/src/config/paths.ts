export const paths = {
  home: { path: '/', getHref: () => '/' },
  team: { path: '/team', getHref: () => '/team' },
  company: { path: '/company', getHref: () => '/company' },
  takeoff: { path: '/takeoff', getHref: () => '/takeoff' },
  /** Static, so it outranks the price book's `/price-book/:tab?`. */
  learnedRates: { path: '/price-book/learned-rates', getHref: () => '/price-book/learned-rates' },
  priceBook: {
    path: '/price-book/:tab?',
    getHref: (tab?: string) => (tab ? `/price-book/${tab}` : '/price-book'),
  },
  customers: { path: '/customers', getHref: () => '/customers' },
  customer: {
    path: '/customers/:id',
    getHref: (id: string) => `/customers/${encodeURIComponent(id)}`,
  },
  pricedTakeoffs: { path: '/priced-takeoffs', getHref: () => '/priced-takeoffs' },
  pricedTakeoff: {
    path: '/priced-takeoffs/:id',
    getHref: (id: string) => `/priced-takeoffs/${encodeURIComponent(id)}`,
  },
  approvals: { path: '/approvals', getHref: () => '/approvals' },
  estimates: { path: '/estimates', getHref: () => '/estimates' },
  estimate: {
    path: '/estimates/:id',
    getHref: (id: string) => `/estimates/${encodeURIComponent(id)}`,
  },
  jobs: { path: '/jobs', getHref: () => '/jobs' },
  /** Static, so it outranks `/jobs/:id`. */
  jobSchedule: {
    path: '/jobs/schedule',
    getHref: (week?: string) => (week ? `/jobs/schedule?week=${week}` : '/jobs/schedule'),
  },
  job: { path: '/jobs/:id', getHref: (id: string) => `/jobs/${encodeURIComponent(id)}` },
  /** The crew's log of one day on the job (`date` is YYYY-MM-DD). */
  jobLog: {
    path: '/jobs/:id/log/:date',
    getHref: (id: string, date: string) =>
      `/jobs/${encodeURIComponent(id)}/log/${encodeURIComponent(date)}`,
  },
  /** Today's log of a job, for a link or bookmark that is right on any day. */
  jobLogToday: {
    path: '/jobs/:id/log',
    getHref: (id: string) => `/jobs/${encodeURIComponent(id)}/log`,
  },
  /** A crew lead's jobs for today and the days ahead, each day's log one tap away. */
  myJobs: { path: '/my-jobs', getHref: () => '/my-jobs' },
  devMailbox: { path: '/dev/mailbox', getHref: () => '/dev/mailbox' },
  signIn: {
    path: '/sign-in',
    getHref: (next?: string | null) =>
      next && next !== '/' ? `/sign-in?next=${encodeURIComponent(next)}` : '/sign-in',
  },
  signUp: { path: '/sign-up', getHref: () => '/sign-up' },
  acceptInvite: {
    path: '/accept-invite/:token',
    getHref: (token: string) => `/accept-invite/${encodeURIComponent(token)}`,
  },
} as const;

/**
 * Accepts only same-site absolute paths, so a crafted `?next=` link cannot send a user
 * who just signed in to another site.
 */
export function safeNextPath(next: string | null | undefined): string {
  if (!next || !next.startsWith('/') || next.startsWith('//') || next.startsWith('/\\')) {
    return paths.home.getHref();
  }
  if (next.startsWith(paths.signIn.path) || next.startsWith(paths.signUp.path)) {
    return paths.home.getHref();
  }
  return next;
}
