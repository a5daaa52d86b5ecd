import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { API_ROOT } from './paths';

/** The API's version, from its package.json. */
export const API_VERSION: string = JSON.parse(readFileSync(join(API_ROOT, 'package.json'), 'utf8')).version;
