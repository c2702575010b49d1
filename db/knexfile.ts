import { knexConfig } from './src/config';

// For the knex CLI: NODE_OPTIONS="--import tsx" knex --knexfile knexfile.ts migrate:latest
export default knexConfig(process.env.DATABASE_URL ?? '');
