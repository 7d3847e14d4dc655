import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  createSteps,
  primaryPhase,
  replicaPhase,
  ScaleOut,
  setUp,
} from '../../scripts/lib/scale-out.mjs';

// `npm run scale:demo` as a test, on the builds `npm test` made: two instances behind nginx, PgBouncer
// in transaction pooling mode, the local fakes, then a streaming replica for the reports. All of it
// private to this file (its own clusters, ports 4700–4799 and 54500–54599, a temporary folder), and
// installs nginx and PgBouncer with apt-get when they are missing.
const scale = new ScaleOut();
const step = createSteps((line) => console.log(line));
const failures = () => step.results.filter((result) => !result.ok);

describe('Pondwright scaled out: two instances behind nginx, PgBouncer, a read replica', () => {
  beforeAll(() => setUp(scale, step), 300_000);
  afterAll(() => scale.stop(), 60_000);

  it('takes a quote from estimate to deposit across both instances, each e-mail sent once', async () => {
    await primaryPhase(scale, step);
    expect(failures()).toEqual([]);
  }, 150_000);

  it('passes the same journey with the reports read from a streaming replica', async () => {
    await replicaPhase(scale, step);
    expect(failures()).toEqual([]);
  }, 180_000);
});
