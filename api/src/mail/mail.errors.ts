import { AppError } from '../common/errors/app-error';

export const MailErrors = {
  devMailDisabled: () => new AppError(404, 'not_found', 'Cannot GET /api/dev/mail'),
  fakeUnreachable: () =>
    new AppError(503, 'mail_fake_unreachable', 'The local mail fake does not answer. Start it with scripts/stack.sh services.'),
};
