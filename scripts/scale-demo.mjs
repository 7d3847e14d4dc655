// `npm run scale:demo`: Pondwright scaled out on this machine. Installs nginx and PgBouncer when
// missing, builds the app, then runs two instances behind nginx, PgBouncer (transaction pooling) in
// front of a private PostgreSQL primary and the local fakes, and takes a quote from estimate to
// deposit across both instances; then again with a streaming replica serving the reports. Each step
// prints PASS or FAIL; everything it started is stopped on exit, on failure and on Ctrl-C.
// docs/scaling.md explains what it shows.
import { createSteps, primaryPhase, replicaPhase, ScaleOut, setUp } from './lib/scale-out.mjs';
import { buildClient, buildServer, buildShared, ensureDependencies } from './lib/setup.mjs';

const scale = new ScaleOut();
const step = createSteps();
let stopping = null;
const stopAll = () => (stopping ??= scale.stop());

let interrupted = false;
for (const [signal, code] of [
  ['SIGINT', 130],
  ['SIGTERM', 143],
]) {
  process.once(signal, async () => {
    interrupted = true;
    console.log(`\n${signal}: stopping everything the demo started...`);
    await stopAll().catch(() => undefined);
    console.log('stopped; its folder is removed');
    process.exit(code);
  });
}
// Should the script end some other way, its children and clusters go with it.
process.on('exit', () => scale.killNow());

async function main() {
  step.section('Build');
  await step('dependencies installed, app built (shared, server, client)', () => {
    ensureDependencies();
    buildShared();
    buildServer();
    buildClient();
  });
  await setUp(scale, step);
  await primaryPhase(scale, step);
  await replicaPhase(scale, step);
}

let crashed = null;
try {
  await main();
} catch (error) {
  // Ctrl-C: the signal handler stops everything and exits.
  if (interrupted) await new Promise(() => {});
  // A failed step has printed itself; anything else is reported here.
  if (!step.results.some((result) => !result.ok)) crashed = error;
}
step.section('Stopping');
await stopAll();
console.log(
  'nginx, both instances, PgBouncer, the fakes and both clusters stopped; folder removed',
);
const passed = step.results.filter((result) => result.ok).length;
const failed = step.results.length - passed + (crashed ? 1 : 0);
if (crashed) console.log(`FAIL  ${crashed.message}`);
console.log(`\n${passed} passed, ${failed} failed — ${failed === 0 ? 'PASS' : 'FAIL'}`);
process.exit(failed === 0 ? 0 : 1);
