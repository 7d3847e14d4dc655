import { execFileSync, spawn, type ChildProcess } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { createServer } from 'node:net';
import { join } from 'node:path';

/** A server the bench started, with where it answers. */
export type BenchServer = { name: string; url: string; child: ChildProcess };

const started: ChildProcess[] = [];

/** A port nobody listens on now: other engineers' servers share this machine. */
export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const probe = createServer();
    probe.once('error', reject);
    probe.listen(0, '127.0.0.1', () => {
      const address = probe.address();
      probe.close(() =>
        typeof address === 'object' && address
          ? resolve(address.port)
          : reject(new Error('no port')),
      );
    });
  });
}

/**
 * Starts `node <script>` from the server folder and waits until `/api/health` answers 200. Its standard
 * output (the real server's request log) is discarded; the last lines of its errors are kept for the
 * message when it fails to start.
 */
export async function startServer(
  name: string,
  script: string,
  port: number,
  env: Record<string, string>,
): Promise<BenchServer> {
  // Only what is given: a variable from the caller's shell (a fake's URL, say) must not change the setup.
  const inherited = { PATH: process.env.PATH ?? '', HOME: process.env.HOME ?? '' };
  const child = spawn(process.execPath, [join(__dirname, '..', script)], {
    env: { ...inherited, ...env },
    stdio: ['ignore', 'ignore', 'pipe'],
  });
  started.push(child);
  let errors = '';
  child.stderr!.on('data', (chunk: Buffer) => {
    errors = (errors + chunk.toString()).slice(-4000);
  });
  const url = `http://127.0.0.1:${port}`;
  const deadline = Date.now() + 60_000;
  while (Date.now() < deadline) {
    if (child.exitCode !== null) {
      throw new Error(`${name} exited with code ${child.exitCode}:\n${errors}`);
    }
    try {
      if ((await fetch(`${url}/api/health`)).ok) return { name, url, child };
    } catch {
      // not listening yet
    }
    await new Promise((resolve) => setTimeout(resolve, 250));
  }
  throw new Error(`${name} did not answer on ${url} within 60 s:\n${errors}`);
}

/** Stops every server this bench started, by its own process id. */
export function stopServers(): void {
  for (const child of started) {
    if (child.exitCode === null && child.signalCode === null) child.kill('SIGTERM');
  }
}

/** Resident set size of a process in MB, from Linux's /proc (null elsewhere). */
export function rssMb(child: ChildProcess): number | null {
  try {
    const status = readFileSync(`/proc/${child.pid}/status`, 'utf8');
    const kb = /VmRSS:\s+(\d+) kB/.exec(status)?.[1];
    return kb ? Number(kb) / 1024 : null;
  } catch {
    return null;
  }
}

/** Clock ticks per second of /proc's CPU times (almost always 100). */
const CLOCK_TICKS = (() => {
  try {
    return Number(execFileSync('getconf', ['CLK_TCK'], { encoding: 'utf8' }).trim()) || 100;
  } catch {
    return 100;
  }
})();

/**
 * CPU time (user + system) a process has used so far, in ms, from /proc (null elsewhere). On a shared
 * machine this is steadier than wall time: another program's load stretches latencies, not CPU time.
 */
export function cpuMs(child: ChildProcess): number | null {
  try {
    const stat = readFileSync(`/proc/${child.pid}/stat`, 'utf8');
    // Fields after the command name, which is in parentheses and may hold spaces: utime is the 12th.
    const fields = stat.slice(stat.lastIndexOf(')') + 2).split(' ');
    return ((Number(fields[11]) + Number(fields[12])) * 1000) / CLOCK_TICKS;
  } catch {
    return null;
  }
}
