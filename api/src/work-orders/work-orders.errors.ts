import { AppError } from '../common/errors/app-error';

export const WorkOrderErrors = {
  notFound: () => new AppError(404, 'work_order_not_found', 'That work order does not exist in your shop.'),
  noneForProject: () =>
    new AppError(404, 'work_order_not_found', 'This project has no work order yet: it opens when the customer has approved the quote and the deposit is paid.'),
  alreadyStarted: () => new AppError(409, 'work_order_already_started', 'The work order is already in the bay.'),
  notStarted: () => new AppError(409, 'work_order_not_started', 'Start the work order first: checks are recorded while the job is in the bay.'),
  finished: () => new AppError(409, 'work_order_finished', 'The work order is finished; its checks can no longer change.'),
  unknownCheck: (key: string) => new AppError(400, 'validation_failed', `checkKey "${key}" is not a check of this work order`, [`checkKey "${key}" is not a check of this work order`]),
  valueRequired: (label: string, range: string) =>
    new AppError(400, 'validation_failed', `"${label}" is measured: send value (allowed ${range})`, [`"${label}" is measured: send value (allowed ${range})`]),
  passedRequired: (label: string) =>
    new AppError(400, 'validation_failed', `"${label}" is confirmed, not measured: send passed true or false`, [`"${label}" is confirmed, not measured: send passed true or false`]),
  noteRequired: (label: string) =>
    new AppError(400, 'validation_failed', `"${label}" is marked not right: say in the note what is wrong (what you found, where), so the next person can put it right`, [
      `note: say what is not right with "${label}"`,
    ]),
  checksOutstanding: (labels: string[]) =>
    new AppError(409, 'work_order_checks_outstanding', `Finish every check with a pass first. Still open or failed: ${labels.join('; ')}.`, labels),
  photoNotFound: () => new AppError(404, 'photo_not_found', 'That photo does not exist in your shop.'),
  photoSignedOff: () =>
    new AppError(409, 'work_order_finished', 'The work order is finished (signed off): its check photos stay with it as the record of the build.'),
};
