import { AppError } from '../common/errors/app-error';

export const LaborOperationErrors = {
  notFound: () => new AppError(404, 'labor_operation_not_found', 'That labor operation does not exist in your shop.'),
  codeTaken: (code: string) => new AppError(409, 'labor_operation_code_taken', `Your shop already has an operation with the code "${code}"; choose another code.`),
};
