export { knexConfig, migrationsDirectory, seedsDirectory } from './config';
export { hashPassword, verifyPassword, argon2Options } from './passwords';
export { setupDatabase, isSeeded, ensureDatabaseExists, dropDatabase } from './setup';
export { secretBox, SecretBoxError, type SecretBox } from './secret-box';
export { badgeCodeBox, badgeCodeHash, generateBadgeCode } from './badge-codes';
