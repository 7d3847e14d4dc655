import { runWithDataSource } from '../database/with-data-source';
import { seedDemo } from './seed-demo';

/** `npm run seed -w server`: adds the demo company when it is missing. */
runWithDataSource('seed', async (dataSource) => {
  const { created } = await seedDemo(dataSource);
  return created.length ? `added ${created.join(', ')}` : 'demo data already present';
});
