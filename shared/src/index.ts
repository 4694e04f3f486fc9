export * from './auth/roles.js';
export * from './auth/credentials.js';
