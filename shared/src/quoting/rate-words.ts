import { formatMoney } from './money-format';

const percent = (value: number) => `${value.toLocaleString('en-US')} %`;

/**
 * How the shop's rates and quote terms are named and read wherever a change to them is told (the audit entry's summary,
 * the audit log's before and after): money in the shop's currency, shares as percents.
 */
export const RATE_FIGURE_WORDS: Record<string, { name: string; format: (value: number, currency: string) => string }> = {
  laborRatePerHour: { name: 'labor rate', format: (value, currency) => `${formatMoney(Math.round(value * 100), currency)} per hour` },
  taxRatePercent: { name: 'tax on parts', format: percent },
  shopSuppliesPercent: { name: 'shop supplies', format: percent },
  laborTaxPercent: { name: 'tax on labor', format: percent },
  suppliesCapCents: { name: 'shop supplies cap', format: (value, currency) => formatMoney(value, currency) },
  depositPercent: { name: 'deposit share', format: percent },
  defaultMarkupPercent: { name: 'default markup', format: percent },
};
