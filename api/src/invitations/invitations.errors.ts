import { AppError } from '../common/errors/app-error';

export const InvitationErrors = {
  invalid: () =>
    new AppError(400, 'invitation_invalid', 'This invitation is not valid any more (used or expired). Ask the shop owner for a new one.'),
  customerOnlyForCustomerRole: () =>
    new AppError(400, 'validation_failed', 'customerId can only be given when inviting someone with the role customer.'),
  customerNotFound: () => new AppError(404, 'customer_not_found', 'That customer does not exist in your shop.'),
  customerHasLogin: () =>
    new AppError(409, 'customer_has_login', 'This customer already has a login. Invite a different customer record.'),
  notFound: () => new AppError(404, 'invitation_not_found', 'That invitation does not exist in your shop (withdrawn, or never sent).'),
  alreadyAccepted: () =>
    new AppError(409, 'invitation_accepted', 'This invitation was already accepted: the person is a member now. Change or remove them under Members.'),
  alreadyMember: () => new AppError(409, 'already_member', 'This person is already a member of your shop.'),
  emailTaken: () =>
    new AppError(
      409,
      'email_taken',
      'An account with this e-mail already exists. Ask the shop owner to invite a different e-mail address.',
    ),
};
