import { AppError } from '../common/errors/app-error';

export const AuthErrors = {
  invalidCredentials: () =>
    new AppError(401, 'invalid_credentials', 'The e-mail or password is not right. Check both, or reset your password.'),
  noMembership: () =>
    new AppError(403, 'no_membership', 'This account is not a member of any shop any more. Ask a shop owner to invite you.'),
  refreshTokenInvalid: () =>
    new AppError(401, 'refresh_token_invalid', 'Your session has ended. Sign in again.'),
  sessionEnded: () =>
    new AppError(401, 'session_ended', 'This session has ended (signed out, or the password was changed). Sign in again.'),
  memberGone: () =>
    new AppError(401, 'membership_revoked', 'You are no longer a member of this shop. Sign in again.'),
  signUpLinkInvalid: () =>
    new AppError(400, 'sign_up_link_invalid', 'This sign-up link is not valid any more (used or older than 24 hours). Sign up again.'),
  resetTokenInvalid: () =>
    new AppError(400, 'reset_token_invalid', 'This password reset link is not valid any more (used or expired). Ask for a new one.'),
};
