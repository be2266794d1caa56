/** Messages of the estimate and quote actions, pinned by the tests. */
export const QUOTE_MESSAGES = {
  stale:
    'Someone else saved this estimate while you were editing. Your lines are kept in the form: review the current estimate, then save again.',
  frozen: 'This quote has been sent and can no longer be changed. Start a new revision to change it; the sent one is kept.',
  currencyChanged: 'This estimate is priced in another currency than the form. Reload the page.',
  empty: 'An estimate needs at least one line before it can be sent.',
  notSent: 'Only a sent quote can be accepted or declined.',
  notLatest: 'A newer revision of this quote exists: record the customer’s decision on the latest one.',
  decided: 'The customer’s decision on this quote is already recorded.',
} as const;

export const quoteNumber = (jobNumber: number, revision: number): string => `Q${jobNumber}-${revision}`;
