/** What `npm run bench -- [flags]` may change; the defaults are the issue's. */
export type BenchOptions = {
  /** Rebuild the 10,000 seeded estimates even when the marker says they are there. */
  reseed: boolean;
  mixedMinutes: number;
  /** Timed rounds per server and route; the median is reported. */
  rounds: number;
  roundSeconds: number;
  warmupSeconds: number;
  /** Only these parts (get, list, takeoff, save, quote, mixed); all when null. */
  only: Set<string> | null;
};

export const BENCH_PARTS = ['get', 'list', 'takeoff', 'save', 'quote', 'mixed'] as const;

const USAGE = `npm run bench -- [--reseed] [--mixed-minutes N] [--rounds N] [--round-seconds N]
                     [--warmup-seconds N] [--only ${BENCH_PARTS.join(',')}]`;

export function parseOptions(argv: string[]): BenchOptions {
  const options: BenchOptions = {
    reseed: false,
    mixedMinutes: 5,
    rounds: 3,
    roundSeconds: 10,
    warmupSeconds: 5,
    only: null,
  };
  for (let index = 0; index < argv.length; index++) {
    const flag = argv[index]!;
    const value = () => {
      const given = argv[++index];
      if (given === undefined) throw new Error(`${flag} needs a value\n${USAGE}`);
      return given;
    };
    const number = (min: number) => {
      const parsed = Number(value());
      if (!Number.isFinite(parsed) || parsed < min)
        throw new Error(`${flag}: give a number ≥ ${min}`);
      return parsed;
    };
    if (flag === '--reseed') options.reseed = true;
    else if (flag === '--mixed-minutes') options.mixedMinutes = number(0.1);
    else if (flag === '--rounds') options.rounds = Math.round(number(1));
    else if (flag === '--round-seconds') options.roundSeconds = number(1);
    else if (flag === '--warmup-seconds') options.warmupSeconds = number(0);
    else if (flag === '--only') {
      const parts = value().split(',');
      const unknown = parts.filter((part) => !(BENCH_PARTS as readonly string[]).includes(part));
      if (unknown.length) throw new Error(`--only: unknown ${unknown.join(', ')}\n${USAGE}`);
      options.only = new Set(parts);
    } else throw new Error(`Unknown flag ${flag}\n${USAGE}`);
  }
  return options;
}

export function includes(options: BenchOptions, part: (typeof BENCH_PARTS)[number]): boolean {
  return options.only === null || options.only.has(part);
}
