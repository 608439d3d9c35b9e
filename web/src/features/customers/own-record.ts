/**
 * The signed-in member's own customer record (the API marks it `ownRecord`): a project opened as "My own truck" is
 * filed under it. It is listed like any customer so those projects stay reachable, but read as oneself.
 */
export const ownRecordWords = {
  tag: 'You',
  note: 'Your own record, used for My own truck',
  /** In place of the portal state: there is no one to invite. */
  portal: 'Your own sign-in',
  /** After the name in a customer picker. */
  optionSuffix: ' (you)',
} as const;
