/**
 * The compound library lives in the supervisor's library tab; every other role reaches a read-only
 * copy under their account tab, so each tab keeps its own navigation stack.
 */
export interface LibraryPaths {
  readonly list: string;
  readonly structure: string;
  readonly compound: (id: string) => string;
  readonly edit: (id: string) => string;
  readonly add: string;
}

const SUPERVISOR_BASE = '/tabs/library';
const EVERYONE_BASE = '/tabs/account/library';

function pathsUnder(base: string): LibraryPaths {
  return {
    list: base,
    structure: `${base}/structure`,
    compound: (id) => `${base}/${encodeURIComponent(id)}`,
    edit: (id) => `${base}/${encodeURIComponent(id)}/edit`,
    add: `${base}/new`,
  };
}

/** The library's paths inside the tab the current location belongs to. */
export function libraryPaths(pathname: string): LibraryPaths {
  return pathsUnder(pathname.startsWith(EVERYONE_BASE) ? EVERYONE_BASE : SUPERVISOR_BASE);
}

