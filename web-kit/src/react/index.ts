// `@nappe/web-kit/react`: the small React pieces both apps' shells use (Chakra v3, React Router,
// TanStack Query). Kept apart from `.` so that entry stays free of React.
export * from './navigation-progress.js';
export * from './page-loader.js';
export * from './query-client.js';
