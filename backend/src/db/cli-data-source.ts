import { createDataSource } from './data-source.js';

/** The one DataSource the TypeORM command line uses; reads DATABASE_URL. */
export default createDataSource(process.env.DATABASE_URL ?? 'postgres://localhost/ferrule');
