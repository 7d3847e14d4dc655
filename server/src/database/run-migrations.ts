import { runWithDataSource } from './with-data-source';

/** `npm run migrate -w server`: applies every pending migration to the configured database. */
runWithDataSource('migrate', async (dataSource) => {
  const applied = await dataSource.runMigrations({ transaction: 'each' });
  const database = dataSource.options.database as string;
  return applied.length
    ? `applied ${applied.map((migration) => migration.name).join(', ')} to ${database}`
    : `${database} is up to date`;
});
