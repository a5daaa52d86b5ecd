/** The Web Crypto digest, present in browsers and in Node 20 as `globalThis.crypto`. */
interface WebCrypto {
  subtle: { digest(algorithm: 'SHA-256', data: Uint8Array<ArrayBuffer>): Promise<ArrayBuffer> };
}

/** Lower-case hex SHA-256 of the bytes (the form attachments declare). */
export async function sha256Hex(bytes: Uint8Array): Promise<string> {
  const { subtle } = (globalThis as unknown as { crypto: WebCrypto }).crypto;
  const digest = await subtle.digest('SHA-256', new Uint8Array(bytes));
  return Array.from(new Uint8Array(digest), (b) => b.toString(16).padStart(2, '0')).join('');
}
