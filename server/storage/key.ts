const SEGMENT = /^[A-Za-z0-9._-]+$/;

/**
 * Keys are built by the server (`photos/<workshopId>/<photoId>/thumb.jpg`), so anything else is a bug or an
 * attack: refuse absolute paths, `..`, empty segments and characters a filesystem or S3 might treat specially.
 */
export function assertStorageKey(key: string): void {
  const segments = key.split('/');
  const valid =
    key.length > 0 &&
    key.length <= 512 &&
    segments.every((s) => SEGMENT.test(s) && s !== '.' && s !== '..');
  if (!valid) throw new Error(`Invalid storage key: ${JSON.stringify(key)}`);
}
