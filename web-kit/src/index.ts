export * from './api-client.js';
export * from './icon-stroke.js';
export * from './save-file.js';
