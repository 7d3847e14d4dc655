// Types for bundle-size.mjs, for the client's TypeScript e2e checks (client/e2e/*bundle-size.e2e.test.ts).
export declare const QUOTE_PAGE_BUDGET_BYTES: number;
export declare const STAFF_APP_BUDGET_BYTES: number;
export declare const QUOTE_TO_STAFF_MAX_RATIO: number;
export declare const LAZY_ONLY: Array<{ name: string; pattern: RegExp }>;

export type Manifest = Record<
  string,
  { file: string; imports?: string[]; dynamicImports?: string[]; css?: string[]; isEntry?: boolean }
>;
export type EntryFiles = { js: string[]; css: string[]; dynamicJs: string[]; dynamicCss: string[] };
export type SizeRow = { file: string; bytes: number; gzip: number };
export type Measured = { rows: SizeRow[]; bytes: number; gzip: number };
export type EntryReport = {
  entry: string;
  js: Measured;
  css: Measured;
  dynamicJs: Measured;
  dynamicCss: Measured;
};

export declare function gzipSize(bytes: Uint8Array): number;
export declare function readManifest(distDir: string): Manifest;
export declare function entryFiles(manifest: Manifest, entryKey: string): EntryFiles;
export declare function measure(distDir: string, files: string[]): Measured;
export declare function entryReport(distDir: string, entryKey: string): EntryReport;
export declare function bundledSources(distDir: string, files: string[]): string[];
export type BudgetCheck = {
  name: string;
  bytes: number;
  goalBytes: number;
  goal: string;
  pass: boolean;
};
export type LazyCheck = { name: string; upFront: string[]; pass: boolean };
export type ClientBudgets = {
  staff: EntryReport;
  quote: EntryReport;
  checks: BudgetCheck[];
  lazy: LazyCheck[];
};

export declare function clientBudgets(distDir: string): ClientBudgets;
export declare function printSizeTable(title: string, measured: Measured): void;
export declare function kb(bytes: number): string;
