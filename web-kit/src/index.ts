export * from './api-client.js';
export * from './save-file.js';
