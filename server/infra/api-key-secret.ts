// An API key's text and what is stored of it. A key reads `hs_<prefix>_<secret>`: the prefix (8
// of [a-z0-9]) names the row and is shown to people; the secret is 32 bytes from the operating
// system's generator (base64url), kept only as its SHA-256. A slow password hash buys nothing
// for 256 random bits (nobody can guess them back, however fast a try is) and would cost CPU on
// every telematics post.
import { createHash, randomBytes, randomInt } from 'node:crypto';

const ALPHABET = 'abcdefghijklmnopqrstuvwxyz0123456789';
const KEY_FORM = /^hs_([a-z0-9]{8})_([A-Za-z0-9_-]{43})$/;

export const hashSecret = (secret: string): Buffer => createHash('sha256').update(secret).digest();

/** A new key: its whole text (shown once), its prefix and the hash of its secret. */
export function newApiKeySecret() {
  const prefix = Array.from({ length: 8 }, () => ALPHABET[randomInt(ALPHABET.length)]).join('');
  const secret = randomBytes(32).toString('base64url');
  return { text: `hs_${prefix}_${secret}`, prefix, secretHash: hashSecret(secret) };
}

/** The prefix and secret hash of a key as sent, or null when it is not in the key's form. */
export function readApiKey(text: string): { prefix: string; secretHash: Buffer } | null {
  const match = KEY_FORM.exec(text);
  return match ? { prefix: match[1], secretHash: hashSecret(match[2]) } : null;
}
