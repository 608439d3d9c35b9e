import { AppError } from '../common/errors/app-error';

export const MembershipErrors = {
  notFound: () => new AppError(404, 'membership_not_found', 'That member does not exist in your shop.'),
  lastOwner: () =>
    new AppError(409, 'last_owner', 'A shop needs at least one owner. Make another member owner first.'),
};
