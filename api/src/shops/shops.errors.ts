import { AppError } from '../common/errors/app-error';

export const ShopErrors = {
  notFound: () => new AppError(404, 'shop_not_found', 'Your shop could not be found. Sign in again.'),
};
