/**
 * A v4 UUID made on the client, so a create that is retried after a lost answer reaches the
 * server with the same id and stays one row. `randomUUID` needs a secure context; plain-HTTP
 * LAN addresses fall back to `getRandomValues`, which every browser offers.
 */
export function newId(): string {
  const c = globalThis.crypto;
  if (typeof c?.randomUUID === 'function') return c.randomUUID();
  const b = new Uint8Array(16);
  c.getRandomValues(b);
  b[6] = (b[6] & 0x0f) | 0x40;
  b[8] = (b[8] & 0x3f) | 0x80;
  const h = Array.from(b, (x) => x.toString(16).padStart(2, '0')).join('');
  return `${h.slice(0, 8)}-${h.slice(8, 12)}-${h.slice(12, 16)}-${h.slice(16, 20)}-${h.slice(20)}`;
}

/** `?a=1&b=2` from the defined, non-empty values of a query object ('' when none). */
export function queryString(query: Record<string, string | number | undefined | null>): string {
  const params = Object.entries(query).filter(([, v]) => v !== undefined && v !== null && v !== '');
  if (!params.length) return '';
  return (
    '?' +
    params.map(([k, v]) => `${encodeURIComponent(k)}=${encodeURIComponent(String(v))}`).join('&')
  );
}
