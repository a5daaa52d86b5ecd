/** Siteband's offline computation: pure TypeScript, shared by the PWA and the API. */
export * from './roles.js';
