import { describe, expect, it } from 'vitest';
import { dataSourceOptions, type DatabaseSettings } from './data-source-options';

const settings: DatabaseSettings = {
  host: '10.0.0.1',
  port: 6432,
  username: 'pondwright',
  password: 'secret',
  database: 'pondwright',
  poolSize: 10,
};

describe('dataSourceOptions', () => {
  it('connects to the primary alone when no replica is configured', () => {
    const options = dataSourceOptions(settings);
    expect(options).toMatchObject({ host: '10.0.0.1', port: 6432, database: 'pondwright' });
    expect(options).not.toHaveProperty('replication');
  });

  it('adds the replica for reports only: reads default to the primary', () => {
    const options = dataSourceOptions({ ...settings, replica: { host: '10.0.0.2', port: 5433 } });
    expect(options).toMatchObject({
      replication: {
        master: { host: '10.0.0.1', port: 6432, username: 'pondwright', database: 'pondwright' },
        slaves: [{ host: '10.0.0.2', port: 5433, username: 'pondwright', password: 'secret' }],
        // TypeORM's own default ('slave') would send every plain read to a replica that may lag.
        defaultMode: 'master',
      },
    });
  });
});
