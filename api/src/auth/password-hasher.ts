import { Injectable } from '@nestjs/common';
import * as bcrypt from 'bcryptjs';
import { BCRYPT_ROUNDS } from './auth.constants';

// Compared against when the e-mail is unknown, so a wrong e-mail takes as long as a wrong password.
const UNKNOWN_USER_HASH = bcrypt.hashSync('no account has this password', BCRYPT_ROUNDS);

/** The one place passwords are hashed and checked; the auth module provides it to every module that takes a password. */
@Injectable()
export class PasswordHasher {
  hash(password: string): Promise<string> {
    return bcrypt.hash(password, BCRYPT_ROUNDS);
  }

  /** Whether `password` matches `hash`; with no stored hash it spends the same time and answers false. */
  async matches(password: string, hash: string | null | undefined): Promise<boolean> {
    const matches = await bcrypt.compare(password, hash ?? UNKNOWN_USER_HASH);
    return matches && hash !== null && hash !== undefined;
  }
}
