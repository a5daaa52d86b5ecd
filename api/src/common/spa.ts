import { stat } from 'node:fs/promises';
import { extname, resolve, sep } from 'node:path';
import { BadRequestException, NotFoundException } from '@nestjs/common';
import type { NextFunction, Request, Response } from 'express';

/** Files the browser must revalidate on every load: the entry page, the service worker and its helpers. */
const ALWAYS_REVALIDATE = /(^|\/)(index\.html|sw\.js|registerSW\.js|manifest\.webmanifest)$|\.html$/;
/** Vite's hashed build output (`assets/index-Bx3k9q_Z.js`) and Workbox's (`workbox-5f7a9d1c.js`). */
const HASHED_ASSET = /(^|\/)assets\/|[.-][A-Za-z0-9_-]{8,}\.(js|mjs|css|woff2?|ttf|png|jpe?g|svg|webp|avif|ico|wasm|map)$/;

/** Cache-Control for a file of the built PWA, by its path relative to the build folder. */
export function cacheControlFor(relativePath: string): string {
  if (ALWAYS_REVALIDATE.test(relativePath)) return 'no-cache';
  if (HASHED_ASSET.test(relativePath)) return 'public, max-age=31536000, immutable';
  return 'no-cache';
}

/** True for `/api` and everything below it (but not `/apiary`). */
export function isApiPath(path: string, prefix = '/api'): boolean {
  return path === prefix || path.startsWith(`${prefix}/`);
}

/**
 * Serves the built PWA from `distDir` on every non-API GET: the file when it exists, otherwise
 * `index.html` so deep links (`/cases/42`) open the app. A missing file with an extension (an asset)
 * is a 404, never index.html in disguise. Other methods outside /api are 404 in the API's error shape.
 * A file the build also wrote compressed (`.br`, `.gz`) is sent compressed to a browser that accepts it.
 */
export function createSpaMiddleware(distDir: string, apiPrefix = '/api') {
  const root = resolve(distDir);
  const indexFile = resolve(root, 'index.html');

  return async (request: Request, response: Response, next: NextFunction): Promise<void> => {
    const path = request.path;
    if (isApiPath(path, apiPrefix)) {
      // Nest's 404 handler covers /api/<anything>, but not the bare prefix.
      const bare = path === apiPrefix || path === `${apiPrefix}/`;
      return bare ? next(new NotFoundException(`Cannot ${request.method} ${path}`)) : next();
    }
    if (request.method !== 'GET' && request.method !== 'HEAD') {
      return next(new NotFoundException(`Cannot ${request.method} ${path}`));
    }

    let decoded: string;
    try {
      decoded = decodeURIComponent(path);
    } catch {
      return next(new BadRequestException('The URL is not correctly percent-encoded'));
    }
    const file = resolve(root, `.${decoded}`);
    const inside = file === root || file.startsWith(root + sep);
    const hidden = decoded.split('/').some((segment) => segment.startsWith('.'));
    if (!inside || hidden || decoded.includes('\0')) return next(new NotFoundException(`Cannot GET ${path}`));

    if (file !== root && (await isFile(file))) return send(request, response, next, file, file.slice(root.length + 1).split(sep).join('/'));
    if (extname(decoded) && extname(decoded) !== '.html') return next(new NotFoundException(`No file at ${path}`));
    if (await isFile(indexFile)) return send(request, response, next, indexFile, 'index.html');
    return next(new NotFoundException('The web app is not built on this server (build it with `npm run build -w pwa`)'));
  };
}

async function isFile(path: string): Promise<boolean> {
  try {
    return (await stat(path)).isFile();
  } catch {
    return false;
  }
}

/** The compressed copies the PWA build writes beside each text file (pwa/precompress.ts), best first. */
const PRECOMPRESSED = [
  { encoding: 'br', suffix: '.br' },
  { encoding: 'gzip', suffix: '.gz' },
] as const;

/** The best compressed copy of `file` the browser accepts, when the build wrote one. */
async function compressedCopy(request: Request, file: string): Promise<(typeof PRECOMPRESSED)[number] | undefined> {
  for (const copy of PRECOMPRESSED) {
    if (request.acceptsEncodings(copy.encoding) === copy.encoding && (await isFile(file + copy.suffix))) return copy;
  }
  return undefined;
}

async function send(request: Request, response: Response, next: NextFunction, file: string, relativePath: string): Promise<void> {
  const headers: Record<string, string> = { 'Cache-Control': cacheControlFor(relativePath), Vary: 'Accept-Encoding' };
  const copy = await compressedCopy(request, file);
  if (copy) {
    headers['Content-Encoding'] = copy.encoding;
    // The type of the file itself, not of its .br or .gz copy (sendFile keeps a type already set).
    response.type(extname(file));
  }
  response.sendFile(copy ? file + copy.suffix : file, { headers, cacheControl: false, dotfiles: 'deny' }, (error) => {
    if (error && !response.headersSent) next(error);
  });
}
