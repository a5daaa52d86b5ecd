export * from './holding-records.js';
