import { runInNewContext } from 'node:vm';
import { describe, expect, it } from 'vitest';
import { sha256Hex } from './sha256-hex.js';

// SHA-256 of "abc" (FIPS 180-2, appendix B.1, from memory) and of nothing.
const ABC = 'ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad';
const EMPTY = 'e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855';

describe('sha256Hex', () => {
  it('hashes a Uint8Array and a whole ArrayBuffer alike', async () => {
    const bytes = new TextEncoder().encode('abc');
    expect(await sha256Hex(bytes)).toBe(ABC);
    expect(await sha256Hex(bytes.buffer)).toBe(ABC);
    expect(await sha256Hex(new Uint8Array(0))).toBe(EMPTY);
  });

  it("hashes only a view's own bytes, not the rest of its buffer", async () => {
    const whole = new TextEncoder().encode('xxabcyy');
    expect(await sha256Hex(whole.subarray(2, 5))).toBe(ABC);
  });

  it("hashes bytes made in another realm (a worker's or a test DOM's) and in a shared buffer", async () => {
    const foreign = runInNewContext('new Uint8Array([97, 98, 99])') as Uint8Array;
    expect(foreign instanceof Uint8Array).toBe(false);
    expect(await sha256Hex(foreign)).toBe(ABC);
    expect(await sha256Hex(runInNewContext('new Uint8Array([97, 98, 99]).buffer') as ArrayBuffer)).toBe(ABC);
    const shared = new Uint8Array(new SharedArrayBuffer(3));
    shared.set([97, 98, 99]);
    expect(await sha256Hex(shared)).toBe(ABC);
  });
});
