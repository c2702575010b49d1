export { knexConfig, migrationsDirectory, seedsDirectory } from './config';
export { hashPassword, verifyPassword, argon2Options } from './passwords';
export { setupDatabase, isSeeded, ensureDatabaseExists, dropDatabase } from './setup';
