import { describe, expect, it } from 'vitest';
import { SHARE_TARGET_PATH, SHARED_FILE_PREFIX, SHARED_FILES_CACHE, SHARED_FILES_PAGE } from './sharedFiles';
import { webManifest } from '../../../pwa-manifest';
// The service worker script as served, read as text.
import worker from '../../../public/share-target-sw.js?raw';

function workerConstant(name: string): string | undefined {
  return worker.match(new RegExp(`const ${name} = '([^']*)'`))?.[1];
}

describe('the share target', () => {
  it('uses the same path, cache and page in the service worker script as in the app', () => {
    expect(workerConstant('SHARE_TARGET_PATH')).toBe(SHARE_TARGET_PATH);
    expect(workerConstant('SHARED_FILES_CACHE')).toBe(SHARED_FILES_CACHE);
    expect(workerConstant('SHARED_FILE_PREFIX')).toBe(SHARED_FILE_PREFIX);
    expect(workerConstant('SHARED_FILES_PAGE')).toBe(SHARED_FILES_PAGE);
  });

  it('is declared in the manifest as a multipart POST to that path, with the field the worker reads', () => {
    const target = webManifest.share_target!;
    expect(target).toMatchObject({ action: SHARE_TARGET_PATH, method: 'POST', enctype: 'multipart/form-data' });
    const files = [target.params.files].flat();
    expect(files.map((f) => f!.name)).toEqual(['files']);
    expect(worker).toContain("form.getAll('files')");
    expect(files[0]!.accept).toEqual(expect.arrayContaining(['.jdx', '.dx', '.jcamp', '.csv', '.tsv', '.txt', 'image/jpeg', 'image/png']));
  });
});
