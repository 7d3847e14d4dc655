// Runs bench/engine.bench.ts (bundled with rolldown, which ships with vite) and measures the engine's
// share of a browser bundle: src/engine/index.ts minified and gzipped, without zod (the client already
// bundles zod for its forms), and the on-demand polygon-offset module (clipper-lib) beside it. Prints "OVER" next to a missed goal but exits 0:
// timings on a shared machine vary with its load.
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, dirname } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { gzipSync } from 'node:zlib';
import { rolldown } from 'rolldown';

const root = join(dirname(fileURLToPath(import.meta.url)), '..');

async function bundle(input, { minify, platform, external = [] }) {
  const build = await rolldown({
    input: join(root, input),
    platform,
    external,
    logLevel: 'silent',
  });
  const { output } = await build.generate({ format: 'esm', minify });
  await build.close();
  return output[0].code;
}

const dir = mkdtempSync(join(tmpdir(), 'engine-bench-'));
try {
  const benchFile = join(dir, 'engine.bench.mjs');
  writeFileSync(
    benchFile,
    await bundle('bench/engine.bench.ts', { minify: false, platform: 'node' }),
  );
  const { runEngineBench } = await import(pathToFileURL(benchFile).href);
  console.log('Takeoff engine benchmark (median of repeated runs)');
  for (const r of runEngineBench()) {
    const ok = r.medianMs <= r.goalMs;
    console.log(
      `  ${r.name.padEnd(44)} ${r.medianMs.toFixed(3).padStart(8)} ms  (goal ≤ ${r.goalMs} ms) ${ok ? 'ok' : 'OVER'}`,
    );
  }
  const kb = (code) => (gzipSync(code).length / 1024).toFixed(1);
  const engine = 'src/engine/index.ts';
  // What the browser loads with the takeoff screen: the engine without zod (the client already ships
  // it for its forms). clipper-lib is not part of it: the engine measures rectangles, ovals and convex
  // outlines itself, and the polygon-offset module is fetched only when an outline bends inward.
  const own = await bundle(engine, { minify: true, platform: 'browser', external: ['zod'] });
  const offsetModule = await bundle('src/engine/polygon-inset.ts', {
    minify: true,
    platform: 'browser',
  });
  const everything = await bundle(engine, { minify: true, platform: 'browser' });
  const withinBudget = gzipSync(own).length <= 30 * 1024;
  console.log('Engine bundle, minified + gzipped');
  console.log(
    `  engine (zod shared with the client)              ${kb(own).padStart(6)} KB  (goal ≤ 30 KB) ${withinBudget ? 'ok' : 'OVER'}`,
  );
  console.log(
    `  polygon-offset module, loaded on demand          ${kb(offsetModule).padStart(6)} KB  (only for outlines that bend inward)`,
  );
  console.log(
    `  engine + zod                                     ${kb(everything).padStart(6)} KB`,
  );
} finally {
  rmSync(dir, { recursive: true, force: true });
}
