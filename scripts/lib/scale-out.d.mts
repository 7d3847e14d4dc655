// Types for scale-out.mjs, for the client's TypeScript e2e test (client/e2e/scale-out.e2e.test.ts).
export type StepResult = { title: string; ok: boolean; error?: string };

/** Runs one step, printing PASS with its notes or FAIL with the error (then rethrowing it). */
export type Step = {
  <T>(title: string, run: (note: (text: string) => void) => T | Promise<T>): Promise<T>;
  say: (line: string) => void;
  section: (title: string) => void;
  results: StepResult[];
};

export declare function createSteps(say?: (line: string) => void): Step;

export declare class ScaleOut {
  dir: string | null;
  stop(): Promise<void>;
  killNow(): void;
}

export declare function sessionStateInServer(): string[];
export declare function setUp(scale: ScaleOut, step: Step): Promise<void>;
export declare function checkRoundRobin(scale: ScaleOut, step: Step): Promise<void>;
export declare function primaryPhase(scale: ScaleOut, step: Step): Promise<unknown>;
export declare function replicaPhase(scale: ScaleOut, step: Step): Promise<void>;
