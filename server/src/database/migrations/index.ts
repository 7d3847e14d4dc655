import { Foundation1796083200000 } from './1796083200000-foundation';

/** Every migration, oldest first. A new migration is added here as well as in its own file. */
export const migrations = [Foundation1796083200000];
