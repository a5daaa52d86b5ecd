/** Keeping instrument checks on the tablet and reading the one in force for a technique. */
import Dexie, { type EntityTable } from 'dexie';
import { useLiveQuery } from 'dexie-react-hooks';
import type { InstrumentCheckResult, Technique } from '@siteband/shared';
import { SitebandDb } from '../../db/db';
import type { InstrumentCheckRow } from '../../db/instrumentChecksTable';

type ChecksTable = EntityTable<InstrumentCheckRow, 'id'>;

/** The record of a finished check; the standard's band objects are reduced to what is shown later. */
export function checkRow(check: InstrumentCheckResult, technique: Technique, fileName: string, checkedAt: number): InstrumentCheckRow {
  return {
    technique,
    standardId: check.standardId,
    standardName: check.standardName,
    pass: check.pass,
    reason: check.reason,
    fileName,
    checkedAt,
    bands: check.bands.map((b) => ({
      expectedCm1: b.expectedCm1,
      foundCm1: b.foundCm1,
      offsetCm1: b.offsetCm1,
      toleranceCm1: b.toleranceCm1,
      toleranceSource: b.band.toleranceSource,
      status: b.status,
    })),
  };
}

/** Adds a finished check; returns the stored row. */
export async function saveInstrumentCheck(table: ChecksTable, row: InstrumentCheckRow): Promise<InstrumentCheckRow> {
  const id = await table.add(row);
  return { ...row, id };
}

/** The latest check of this technique, whether it passed or not (a failed latest check is not in force). */
export function latestInstrumentCheck(table: ChecksTable, technique: Technique): Promise<InstrumentCheckRow | undefined> {
  return table.where('[technique+checkedAt]').between([technique, Dexie.minKey], [technique, Dexie.maxKey]).last();
}

let db: SitebandDb | undefined;

/** The app's database for the checks (Dexie opens it on first use). */
export function checksTable(): ChecksTable {
  db ??= new SitebandDb();
  return db.instrumentChecks;
}

/** Live: the latest check of a technique; undefined while loading, null when none was made. */
export function useLatestInstrumentCheck(technique: Technique): InstrumentCheckRow | null | undefined {
  return useLiveQuery(async () => (await latestInstrumentCheck(checksTable(), technique)) ?? null, [technique]);
}
