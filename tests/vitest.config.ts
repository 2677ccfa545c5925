// Temporary alias while helpers finish; the config lives in vitest.config.mts.
export { default } from './vitest.config.mts';
