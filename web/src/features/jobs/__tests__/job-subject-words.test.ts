import { describe, expect, it } from 'vitest';
import { jobSubjectWords } from '../job-subject-words';

describe("a background job's subject in words", () => {
  it("says what the payment provider's event did and keeps its reference apart", () => {
    expect(jobSubjectWords('Deposit payment for quote Q-0003: payment_intent.succeeded (evt_e9d65daeb5cfd8df4c861527)')).toEqual({
      text: 'Deposit payment settled for quote Q-0003',
      reference: 'evt_e9d65daeb5cfd8df4c861527',
    });
    expect(jobSubjectWords('Payment provider event: payment_intent.payment_failed (evt_1)')).toEqual({ text: 'Deposit payment failed', reference: 'evt_1' });
    expect(jobSubjectWords('Payment provider event: charge.refunded (evt_2)')).toEqual({ text: 'Payment provider event', reference: 'evt_2' });
  });

  it('leaves any other subject as written', () => {
    expect(jobSubjectWords('Quote Q-0003 (revision 1) e-mail to customer@ironbark.test')).toEqual({ text: 'Quote Q-0003 (revision 1) e-mail to customer@ironbark.test' });
  });
});
