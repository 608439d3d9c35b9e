import { Injectable } from '@nestjs/common';
import { JwtService, TokenExpiredError } from '@nestjs/jwt';
import { QuoteErrors } from './quotes.errors';

export interface QuoteLinkClaims {
  /** quote id */
  q: string;
  /** shop id */
  s: string;
  /** revision number the link was sent with */
  r: number;
}

const AUDIENCE = 'quote-approval';

/**
 * Signed, expiring links to a quote's approval page: an HS256 token (its own secret, derived from the app's)
 * holding the quote, shop and revision. A changed character fails the signature; a passed expiry is refused.
 */
@Injectable()
export class QuoteLinksService {
  constructor(private readonly jwt: JwtService) {}

  sign(claims: QuoteLinkClaims, expiresAt: Date): string {
    const expiresInSeconds = Math.max(60, Math.floor((expiresAt.getTime() - Date.now()) / 1000));
    return this.jwt.sign({ ...claims }, { audience: AUDIENCE, expiresIn: expiresInSeconds });
  }

  verify(token: string): QuoteLinkClaims {
    try {
      const claims = this.jwt.verify<QuoteLinkClaims & { aud: string }>(token, { audience: AUDIENCE });
      if (typeof claims.q !== 'string' || typeof claims.s !== 'string' || !Number.isInteger(claims.r)) throw QuoteErrors.linkInvalid();
      return { q: claims.q, s: claims.s, r: claims.r };
    } catch (error) {
      if (error instanceof TokenExpiredError) throw QuoteErrors.linkExpired();
      throw QuoteErrors.linkInvalid();
    }
  }
}
