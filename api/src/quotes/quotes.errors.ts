import { formatCalendarDate, formatDayIn } from '@swapwright/shared';
import { AppError } from '../common/errors/app-error';

export const QuoteErrors = {
  notFound: () => new AppError(404, 'quote_not_found', 'That quote does not exist in your shop.'),
  revisionNotFound: (number: number) => new AppError(404, 'quote_revision_not_found', `This quote has no revision ${number}.`),
  notEditable: (status: string) =>
    new AppError(409, 'quote_not_editable', `This quote is ${status}; an approved quote is not changed. Start a new quote for further work.`),
  invalidMoney: (message: string) => new AppError(400, 'validation_failed', message, [message]),
  emptyQuote: () => new AppError(422, 'quote_empty', 'Add at least one parts or labor line before sending the quote.'),
  noCustomerEmail: () =>
    new AppError(422, 'quote_customer_without_email', "The project's customer has no e-mail address; add one to the customer before sending."),
  ownProject: () =>
    new AppError(
      422,
      'quote_own_project',
      'This project is your own truck, so there is no customer to send the quote to. Keep the quote as the budget of your build.',
    ),
  notOwnProject: () =>
    new AppError(
      422,
      'quote_not_own_project',
      "Only a quote of your own truck starts a build this way. A customer's quote opens its work order once the customer approves it and pays the deposit.",
    ),
  ownBuildWithoutLabor: () =>
    new AppError(422, 'quote_own_build_without_labor', 'Add at least one labor line first: the build sheet has a step for each labor line of your budget.'),
  ownBuildStarted: (revision: number | null) =>
    new AppError(
      409,
      'quote_own_build_started',
      `Your build was already started from this budget${revision ? ` (revision ${revision})` : ''}; open its work order under Work orders. For further work, start a new quote.`,
    ),
  pastValidity: (validUntil: string) =>
    new AppError(
      422,
      'quote_validity_past',
      `This quote was valid until ${formatCalendarDate(validUntil)}, which has passed. Set a later day under "Discount, deposit and validity", then send it.`,
    ),
  validUntilPast: (validUntil: string) => {
    const sentence = `The last day to accept, ${formatCalendarDate(validUntil)}, has already passed; choose today or a later day.`;
    return new AppError(400, 'validation_failed', sentence, [sentence]);
  },
  nothingToSend: () => new AppError(409, 'quote_already_sent', 'This revision was already sent; change the quote to make a new revision, then send that.'),
  notAwaitingAnswer: (status: string) => new AppError(409, 'quote_not_awaiting_answer', `This quote is ${status} and cannot be answered now.`),
  lapsed: (validUntil: string) =>
    new AppError(409, 'quote_lapsed', `This quote was valid until ${formatCalendarDate(validUntil)}. Ask the shop for a fresh quote.`),
  reasonRequired: () => new AppError(400, 'validation_failed', 'Say why the quote is declined (reason).', ['reason must not be empty when declining']),
  fitReportNotOfProject: () => new AppError(400, 'validation_failed', 'fitReportId must be a fit report of this project.', ['fitReportId must be a fit report of this project']),
  badLine: (detail: string) => new AppError(400, 'validation_failed', detail, [detail]),
  linkInvalid: () => new AppError(401, 'quote_link_invalid', 'This quote link is not valid. Open the link from the e-mail exactly as sent, or ask the shop to send it again.'),
  linkExpired: () => new AppError(410, 'quote_link_expired', 'This quote link has expired. Ask the shop to send the quote again.'),
  /** An older revision's link once a later revision was accepted: what happened and when, not "open the newest e-mail". */
  linkAfterAcceptance: (revision: number | null, answeredAt: Date | null, depositPaidAt: Date | null, timeZone: string) => {
    const accepted = `This quote was already accepted${answeredAt ? ` on ${formatDayIn(answeredAt, timeZone)}` : ''}${revision ? ` (revision ${revision})` : ''}`;
    const deposit = depositPaidAt ? `, and the deposit was paid on ${formatDayIn(depositPaidAt, timeZone)}` : '';
    return new AppError(409, 'quote_link_already_accepted', `${accepted}${deposit}. There is nothing more to do with this link; the shop will be in touch about the work.`);
  },
  linkSuperseded: () => new AppError(409, 'quote_link_superseded', 'The shop has sent a newer revision of this quote; open the link in the newest e-mail.'),
  compareSame: () => new AppError(400, 'validation_failed', 'Give two different revision numbers to compare.', ['from and to must differ']),
};
