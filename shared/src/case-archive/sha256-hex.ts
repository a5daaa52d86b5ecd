/** The part of the Web Crypto API used here: browsers, workers and Node 20 have it as `globalThis.crypto`. */
interface WebCryptoDigest {
  subtle?: { digest(algorithm: 'SHA-256', data: Uint8Array<ArrayBuffer>): Promise<ArrayBuffer> };
}

/**
 * Lower-case hex SHA-256 of the bytes (the form attachments declare), from a `Uint8Array` (a view
 * hashes only its own bytes) or a whole `ArrayBuffer`. The bytes are copied into a fresh buffer of this
 * realm first, so a view of a shared buffer or of another realm's buffer (a worker's, a test DOM's) is
 * hashed as well as a plain one.
 */
export async function sha256Hex(bytes: Uint8Array | ArrayBuffer): Promise<string> {
  const subtle = (globalThis as { crypto?: WebCryptoDigest }).crypto?.subtle;
  if (!subtle) throw new Error('SHA-256 needs the Web Crypto API (crypto.subtle): a secure context (https or localhost) in a browser, or Node 20 or later');
  const view = ArrayBuffer.isView(bytes) ? new Uint8Array(bytes.buffer, bytes.byteOffset, bytes.byteLength) : new Uint8Array(bytes);
  const digest = await subtle.digest('SHA-256', Uint8Array.from(view));
  return Array.from(new Uint8Array(digest), (b) => b.toString(16).padStart(2, '0')).join('');
}
