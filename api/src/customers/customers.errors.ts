import { AppError } from '../common/errors/app-error';

export const CustomerErrors = {
  notFound: () => new AppError(404, 'customer_not_found', 'That customer does not exist in your shop.'),
  hasProjects: (count: number) =>
    new AppError(
      409,
      'customer_has_projects',
      `This customer still has ${count} project${count === 1 ? '' : 's'}. Delete or move them before deleting the customer.`,
    ),
};
