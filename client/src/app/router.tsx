import { useMemo } from 'react';
import { createBrowserRouter, RouterProvider, type RouteObject } from 'react-router-dom';
import { PageLoader } from '@/components/page-loader';
import { paths } from '@/config/paths';
import { NotFoundRoute } from './routes/not-found';
import { Root } from './routes/root';
import { RouteError } from './routes/route-error';
import { SignInRoute } from './routes/sign-in';

/** The whole route tree; tests mount the same tree in a memory router. */
export function createAppRoutes(): RouteObject[] {
  return [
    {
      element: <Root />,
      errorElement: <RouteError />,
      hydrateFallbackElement: <PageLoader fullScreen label="Opening Pondwright…" />,
      children: [
        // Sign-in is where most visits start, and signing out must reach it without a
        // network round trip, so it is not split into its own chunk.
        { path: paths.signIn.path, Component: SignInRoute },
        {
          path: paths.signUp.path,
          lazy: async () => ({ Component: (await import('./routes/sign-up')).SignUpRoute }),
        },
        {
          path: paths.acceptInvite.path,
          lazy: async () => ({
            Component: (await import('./routes/accept-invite')).AcceptInviteRoute,
          }),
        },
        {
          path: paths.home.path,
          lazy: async () => ({ Component: (await import('./routes/app/root')).AppRoot }),
          children: [
            {
              index: true,
              lazy: async () => ({ Component: (await import('./routes/app/home')).HomeRoute }),
            },
            {
              path: paths.team.path,
              lazy: async () => ({ Component: (await import('./routes/app/team')).TeamRoute }),
            },
            {
              path: paths.company.path,
              lazy: async () => ({
                Component: (await import('./routes/app/company')).CompanyRoute,
              }),
            },
            {
              // The takeoff engine and its polygon library load with this chunk only.
              path: paths.takeoff.path,
              lazy: async () => ({
                Component: (await import('./routes/app/takeoff')).TakeoffRoute,
              }),
            },
            {
              path: paths.learnedRates.path,
              lazy: async () => ({
                Component: (await import('./routes/app/learned-rates')).LearnedRatesRoute,
              }),
            },
            {
              // Tables, the policy form and the CSV tools load with this chunk; charts load later still.
              path: paths.priceBook.path,
              lazy: async () => ({
                Component: (await import('./routes/app/price-book')).PriceBookRoute,
              }),
            },
            {
              path: paths.customers.path,
              lazy: async () => ({
                Component: (await import('./routes/app/customers')).CustomersRoute,
              }),
            },
            {
              path: paths.customer.path,
              lazy: async () => ({
                Component: (await import('./routes/app/customer')).CustomerRoute,
              }),
            },
            {
              path: paths.pricedTakeoffs.path,
              lazy: async () => ({
                Component: (await import('./routes/app/priced-takeoffs')).PricedTakeoffsRoute,
              }),
            },
            {
              path: paths.pricedTakeoff.path,
              lazy: async () => ({
                Component: (await import('./routes/app/priced-takeoff')).PricedTakeoffRoute,
              }),
            },
            {
              path: paths.estimates.path,
              lazy: async () => ({
                Component: (await import('./routes/app/estimates')).EstimatesRoute,
              }),
            },
            {
              path: paths.estimate.path,
              lazy: async () => ({
                Component: (await import('./routes/app/estimate')).EstimateRoute,
              }),
            },
            {
              path: paths.jobs.path,
              lazy: async () => ({ Component: (await import('./routes/app/jobs')).JobsRoute }),
            },
            {
              // The week calendar; the cost report's charts load with the job's chunk, not this one.
              path: paths.jobSchedule.path,
              lazy: async () => ({
                Component: (await import('./routes/app/job-schedule')).JobScheduleRoute,
              }),
            },
            {
              path: paths.job.path,
              lazy: async () => ({ Component: (await import('./routes/app/job')).JobRoute }),
            },
            {
              // The crew's daily log, phone-first; it works offline through an outbox on the phone.
              path: paths.jobLog.path,
              lazy: async () => ({
                Component: (await import('./routes/app/daily-log')).DailyLogRoute,
              }),
            },
            {
              path: paths.jobLogToday.path,
              lazy: async () => ({
                Component: (await import('./routes/app/daily-log')).DailyLogRoute,
              }),
            },
            {
              path: paths.myJobs.path,
              lazy: async () => ({ Component: (await import('./routes/app/my-jobs')).MyJobsRoute }),
            },
            {
              // A developer tool: the e-mails the local fake SMTP server caught. 404 in production.
              path: paths.devMailbox.path,
              lazy: async () => ({
                Component: (await import('./routes/app/dev-mailbox')).DevMailboxRoute,
              }),
            },
            {
              path: paths.approvals.path,
              lazy: async () => ({
                Component: (await import('./routes/app/approvals')).ApprovalsRoute,
              }),
            },
          ],
        },
        { path: '*', Component: NotFoundRoute },
      ],
    },
  ];
}

export function AppRouter() {
  const router = useMemo(() => createBrowserRouter(createAppRoutes()), []);
  return <RouterProvider router={router} />;
}
