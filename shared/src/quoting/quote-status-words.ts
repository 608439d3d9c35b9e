/** The app's words for a quote's status, on the quote's tag, in the audit log and (lower-cased) in the API's sentences. */
export const QUOTE_STATUS_LABELS: Record<'drafting' | 'awaiting-answer' | 'approved' | 'turned-down' | 'lapsed', string> = {
  drafting: 'Being written',
  'awaiting-answer': 'Awaiting the customer',
  approved: 'Approved',
  'turned-down': 'Turned down',
  lapsed: 'Lapsed',
};
