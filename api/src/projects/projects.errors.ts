import { AppError } from '../common/errors/app-error';
import { withArticle } from '../common/text/article';

export const ProjectErrors = {
  notFound: () => new AppError(404, 'project_not_found', 'That project does not exist in your shop.'),
  customerNotFound: () => new AppError(404, 'customer_not_found', 'The customer of this project does not exist in your shop.'),
  fieldsForbidden: (fields: string[]) =>
    new AppError(
      403,
      'project_fields_forbidden',
      `Your role may change only the placement of a project, not: ${fields.join(', ')}.`,
    ),
  catalogRefNotFound: (field: string, singular: string) => {
    const message = `${field} must be the id of ${withArticle(singular)} in your shop's catalog`;
    return new AppError(400, 'validation_failed', message, [message]);
  },
  notNullable: (field: string) => new AppError(400, 'validation_failed', `${field} must not be null`, [`${field} must not be null`]),
};
