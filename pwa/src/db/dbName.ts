/** The name of Siteband's IndexedDB database on the tablet. */
export const DB_NAME = 'siteband';
