/** Keys of the `syncMeta` table: the pull cursor and this browser profile's client id. */
export type SyncMetaKey = 'pullCursor' | 'clientId';

/** One row of the `syncMeta` table. */
export interface SyncMetaRow {
  key: SyncMetaKey;
  value: string;
}

/** Dexie index spec: primary key only. */
export const syncMetaSchema = 'key';
