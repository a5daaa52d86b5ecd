import { useEffect, useState } from 'react';

/** Storage the browser grants the app, in bytes, and whether it promised to keep it. */
export interface StorageEstimate {
  usedBytes: number;
  quotaBytes: number;
  persisted: boolean;
}

/** Below this share or amount of free storage the tablet warns (common practice, not a standard). */
export const LOW_SHARE = 0.1;
export const LOW_BYTES = 200 * 1024 * 1024;

/** True when the free storage is under 10 % of the quota or under 200 MB. */
export function storageIsLow({ usedBytes, quotaBytes }: Pick<StorageEstimate, 'usedBytes' | 'quotaBytes'>): boolean {
  const free = Math.max(0, quotaBytes - usedBytes);
  return free < LOW_BYTES || free < quotaBytes * LOW_SHARE;
}

/**
 * Asks the browser to keep the app's data even when the device runs short (without that, an
 * evicted database would lose unsynced field records), then reads usage; undefined where the
 * browser offers no storage API.
 */
export function useStorageEstimate(refreshKey: unknown): StorageEstimate | null | undefined {
  const [estimate, setEstimate] = useState<StorageEstimate | null>();
  useEffect(() => {
    const storage = navigator.storage;
    if (!storage?.estimate) {
      setEstimate(null);
      return;
    }
    let live = true;
    void (async () => {
      const persisted = (await storage.persisted?.()) || ((await storage.persist?.()) ?? false);
      const { usage = 0, quota = 0 } = await storage.estimate();
      if (live) setEstimate({ usedBytes: usage, quotaBytes: quota, persisted });
    })();
    return () => {
      live = false;
    };
  }, [refreshKey]);
  return estimate;
}
