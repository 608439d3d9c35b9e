import type { Finding } from '@swapwright/shared';

/** A failing length finding with a 12.7 mm minimum; `over` sets what a test is about. */
export function finding(over: Partial<Finding>): Finding {
  return {
    checkId: 'envelope.x',
    group: 'envelope',
    title: 'A check',
    status: 'fails',
    measured: 0,
    required: 12.7,
    margin: -12.7,
    limit: 'min',
    unit: 'mm',
    message: 'Message.',
    missing: [],
    remedies: [],
    thresholdSource: 'Common practice',
    ...over,
  };
}
