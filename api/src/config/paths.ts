import { resolve } from 'node:path';

/**
 * The repository root: `api/src/config` and `api/dist/config` both sit three levels below it,
 * so the same relative step works from the TypeScript sources (tests) and the build.
 */
export const REPO_ROOT = resolve(__dirname, '..', '..', '..');

/** The API package's own folder (holds package.json). */
export const API_ROOT = resolve(__dirname, '..', '..');
