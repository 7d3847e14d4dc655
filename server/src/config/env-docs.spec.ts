import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { envSchema } from './env.schema';

const operationsDoc = readFileSync(resolve(__dirname, '../../../docs/operations.md'), 'utf8');
const documented = new Set(
  [...operationsDoc.matchAll(/^\| `([A-Z][A-Z0-9_]*)` \|/gm)].map((match) => match[1]!),
);

describe('docs/operations.md', () => {
  it('has a row in its settings table for every setting the server reads, and no other', () => {
    const settings = Object.keys(envSchema.shape).sort();
    expect(settings.filter((name) => !documented.has(name))).toEqual([]);
    const scriptsOnly = ['DB_TEST_NAME', 'PONDWRIGHT_PG_DATA', 'RESTORE_DB_NAME'];
    expect([...documented].filter((name) => !settings.includes(name)).sort()).toEqual(
      scriptsOnly.sort(),
    );
  });
});
