import { useCallback, useEffect, useState } from 'react';
import { listSharedFiles, type SharedFile } from './sharedFiles';

/** The shared files waiting on this tablet (undefined while reading), and a way to read them again. */
export function useSharedFiles(): { files: SharedFile[] | undefined; refresh: () => Promise<void> } {
  const [files, setFiles] = useState<SharedFile[]>();
  const refresh = useCallback(async () => setFiles(await listSharedFiles()), []);
  useEffect(() => {
    void refresh();
  }, [refresh]);
  return { files, refresh };
}
