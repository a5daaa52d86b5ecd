/**
 * A `Content-Disposition: attachment` header value for any file name: an ASCII fallback plus the exact
 * UTF-8 name (RFC 6266 with RFC 8187 encoding), since header values cannot carry raw non-ASCII text.
 */
export function attachmentDisposition(fileName: string): string {
  const fallback = fileName.replace(/[^\x20-\x7e]|["\\]/g, '_');
  const encoded = encodeURIComponent(fileName).replace(/['()*]/g, (char) => `%${char.charCodeAt(0).toString(16).toUpperCase()}`);
  return `attachment; filename="${fallback}"; filename*=UTF-8''${encoded}`;
}
