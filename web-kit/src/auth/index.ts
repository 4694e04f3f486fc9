// `@nappe/web-kit/auth`: the account screens both apps share (React, Chakra v3, TanStack Query,
// react-hook-form). Each app gives the hooks its own client once, with ApiClientProvider; code
// outside React (router loaders, the app's getMe) passes the client to the plain functions.
export * from './account-frame.js';
export * from './api-client-provider.js';
export * from './auth-keys.js';
export * from './confirm-password-reset.js';
export * from './describe-auth-error.js';
export * from './forgot-password-flow.js';
export * from './forgot-password-form.js';
export * from './form-error-alert.js';
export * from './logout.js';
export * from './me-query.js';
export * from './password-input.js';
export * from './request-password-reset.js';
export * from './reset-password-flow.js';
export * from './reset-password-form.js';
export * from './use-api-client.js';
export * from './use-countdown.js';
