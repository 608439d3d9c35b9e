import { createHash, randomBytes } from 'node:crypto';

/** Opaque tokens (refresh, password reset, invitation): random for the client, only the sha256 stored. */
export function newOpaqueToken(): { token: string; hash: string } {
  const token = randomBytes(32).toString('base64url');
  return { token, hash: hashToken(token) };
}

export function hashToken(token: string): string {
  return createHash('sha256').update(token, 'utf8').digest('hex');
}
