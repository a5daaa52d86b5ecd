import { describe, expect, it } from 'vitest';
import { areaOfPath } from './appArea';

describe('areaOfPath', () => {
  it('draws sign-in and set-password without Ionic, with or without a trailing slash', () => {
    expect(areaOfPath('/signin')).toBe('public');
    expect(areaOfPath('/signin/')).toBe('public');
    expect(areaOfPath('/set-password')).toBe('public');
  });

  it('gives every other path to the signed-in area, which also redirects "/" and unknown paths', () => {
    expect(areaOfPath('/')).toBe('signedIn');
    expect(areaOfPath('/tabs/cases')).toBe('signedIn');
    expect(areaOfPath('/signin-help')).toBe('signedIn');
    expect(areaOfPath('/tabs/signin')).toBe('signedIn');
    expect(areaOfPath('/nowhere')).toBe('signedIn');
  });
});
