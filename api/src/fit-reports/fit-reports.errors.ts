import { AppError } from '../common/errors/app-error';

export const FitReportErrors = {
  notFound: () => new AppError(404, 'fit_report_not_found', 'That fit report does not exist in your shop.'),
  notReady: (needed: string[]) => {
    const message = `Before the fit check can run, ${needed.join('; ')}.`;
    return new AppError(422, 'fit_check_not_ready', message, needed);
  },
  badSelection: (details: string[]) =>
    new AppError(400, 'fit_selection_invalid', details[0] ?? 'The fit selections refer to parts that are not in your catalog.', details),
  compareSameReport: () =>
    new AppError(400, 'fit_reports_compare_invalid', 'Give two different report ids as a and b.'),
};
