import { AppError } from '../common/errors/app-error';

export const UserErrors = {
  emailTaken: () =>
    new AppError(409, 'email_taken', 'An account with this e-mail already exists. Sign in, or reset the password.'),
};
