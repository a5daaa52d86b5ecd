import { cacheControlFor, isApiPath } from './spa';

describe('cacheControlFor', () => {
  it.each(['index.html', 'sw.js', 'registerSW.js', 'manifest.webmanifest', 'offline.html'])('revalidates %s on every load', (path) => {
    expect(cacheControlFor(path)).toBe('no-cache');
  });

  it.each(['assets/index-Bx3k9q_Z.js', 'assets/index-D4f1a2b3.css', 'workbox-5f7a9d1c.js', 'assets/atkinson-latin-400.woff2'])(
    'caches hashed build output %s for a year',
    (path) => {
      expect(cacheControlFor(path)).toBe('public, max-age=31536000, immutable');
    },
  );

  it('revalidates unhashed files such as icons', () => {
    expect(cacheControlFor('icons/icon-192.png')).toBe('no-cache');
  });
});

describe('isApiPath', () => {
  it.each([
    ['/api', true],
    ['/api/', true],
    ['/api/users', true],
    ['/apiary', false],
    ['/cases/api', false],
    ['/', false],
  ])('%s → %s', (path, expected) => {
    expect(isApiPath(path)).toBe(expected);
  });
});
