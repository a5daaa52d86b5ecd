import { describe, expect, it } from 'vitest';
import { libraryPaths } from './libraryPaths';

describe('libraryPaths', () => {
  it('keeps the supervisor inside the library tab', () => {
    const paths = libraryPaths('/tabs/library/chlorine');
    expect(paths.list).toBe('/tabs/library');
    expect(paths.compound('chlorine')).toBe('/tabs/library/chlorine');
    expect(paths.edit('chlorine')).toBe('/tabs/library/chlorine/edit');
    expect(paths.structure).toBe('/tabs/library/structure');
  });

  it('keeps everyone else inside the account tab', () => {
    const paths = libraryPaths('/tabs/account/library');
    expect(paths.compound('hydrogen-sulfide')).toBe('/tabs/account/library/hydrogen-sulfide');
    expect(paths.structure).toBe('/tabs/account/library/structure');
  });

  it('escapes ids so a path cannot be broken by one', () => {
    expect(libraryPaths('/tabs/library').compound('a/b')).toBe('/tabs/library/a%2Fb');
  });
});
