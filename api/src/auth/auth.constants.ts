export const ACCESS_TOKEN_TTL_SECONDS = 15 * 60;
export const REFRESH_TOKEN_TTL_MS = 30 * 24 * 60 * 60 * 1000;
export const PASSWORD_RESET_TTL_MS = 30 * 60 * 1000;
export const SIGN_UP_LINK_TTL_MS = 24 * 60 * 60 * 1000;
export const BCRYPT_ROUNDS = 10;

export interface AccessTokenPayload {
  sub: string;
  /** membership id: the shop and role this token acts in */
  mid: string;
  /** session id: the sign-in (refresh-token family) this token belongs to; signing out ends it */
  sid: string;
  /** the user's session version when issued; a password reset bumps it and ends every token */
  sv: number;
}
