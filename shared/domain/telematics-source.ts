// A reading that came in with an organization API key names the key in its import key (the
// column that says where an imported reading came from): `api-key:<prefix>:<name>`, so the
// machine page can say which feed sent it, even after the key is revoked.

const PREFIX = 'api-key:';

/** The import key of a reading sent with the key of this prefix and name. */
export const apiKeySource = (prefix: string, name: string) => `${PREFIX}${prefix}:${name}`;

/** The name of the API key a reading came with, or null when it came otherwise. */
export function apiKeyNameOf(importKey: string | null | undefined): string | null {
  if (!importKey?.startsWith(PREFIX)) return null;
  const rest = importKey.slice(PREFIX.length);
  const colon = rest.indexOf(':');
  return colon < 0 ? null : rest.slice(colon + 1) || null;
}
