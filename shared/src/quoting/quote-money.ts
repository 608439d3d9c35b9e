import { assertCents, divideRounded, markedUp, MoneyInputError, percentOf, scaledRate, toNumber } from './exact-money';

/**
 * The published quote rule (each step rounds half away from zero to the cent, each line on its own):
 * 1. parts line: unit = catalog price, or round(cost x (1 + markup)) when priced from cost; total = unit x quantity
 * 2. labor line: round(hours x shop rate), hours to a tenth
 * 3. shop supplies: min(round(labor subtotal x supplies %), supplies cap)
 * 4. discount: a percent takes round(parts x d) off parts and round(labor x d) off labor; a fixed amount is
 *    split in proportion to the parts and labor subtotals, the parts share rounded and labor taking the rest
 * 5. tax: round((parts - parts discount) x parts tax) + round((labor - labor discount + supplies) x labor tax)
 * 6. total = parts - parts discount + labor - labor discount + supplies + tax
 * 7. deposit: round(total x deposit %) or a fixed amount, never more than the total
 */
const ROUNDING_RULE_AFTER_PARTS =
  'each labor line is hours (to a tenth) x the shop rate, rounded; shop supplies are the labor subtotal x the supplies rate, rounded, ' +
  'and never more than the cap; a percent discount is taken from parts and from labor, each rounded; a fixed discount is split between ' +
  'parts and labor in proportion to their subtotals (the parts share rounded, labor takes the rest); tax is parts after discount x the ' +
  'parts tax rate, rounded, plus labor after discount with supplies x the labor tax rate, rounded; the deposit is the total x the deposit ' +
  'rate, rounded, or a fixed amount, never more than the total. Rounding is to the nearest cent, halves away from zero, only at these steps.';

/** The rounding rule as the shop reads it, with how a unit priced from cost is worked out. */
export const QUOTE_ROUNDING_RULE =
  'Every amount is worked in whole cents. Each parts line is its unit price times its quantity (a unit priced from cost is cost x (1 + markup), rounded); ' +
  ROUNDING_RULE_AFTER_PARTS;

/** The same rule as the customer reads it (quote page, PDF): the shop's cost and markup are its own business. */
export const QUOTE_ROUNDING_RULE_FOR_CUSTOMER =
  'Every amount is worked in whole cents. Each parts line is its unit price times its quantity; ' + ROUNDING_RULE_AFTER_PARTS;

export const PART_PRICINGS = ['list', 'cost-plus'] as const;
export type PartPricing = (typeof PART_PRICINGS)[number];

export interface PartLineInput {
  quantity: number;
  pricing: PartPricing;
  /** Catalog (list) price per unit, for pricing 'list'. */
  unitPriceCents?: number | null;
  /** Cost per unit and markup percent, for pricing 'cost-plus'. */
  unitCostCents?: number | null;
  markupPercent?: number | null;
}

export interface LaborLineInput {
  hours: number;
}

export const DISCOUNT_KINDS = ['none', 'percent', 'fixed'] as const;
export type DiscountKind = (typeof DISCOUNT_KINDS)[number];
export const DEPOSIT_KINDS = ['percent', 'fixed'] as const;
export type DepositKind = (typeof DEPOSIT_KINDS)[number];

export interface QuoteMoneyInput {
  parts: PartLineInput[];
  labor: LaborLineInput[];
  laborRateCents: number;
  suppliesPercent: number;
  /** null: no cap. */
  suppliesCapCents: number | null;
  discount: { kind: DiscountKind; percent?: number | null; amountCents?: number | null };
  partsTaxPercent: number;
  laborTaxPercent: number;
  deposit: { kind: DepositKind; percent?: number | null; amountCents?: number | null };
}

export interface PartLineMoney {
  unitPriceCents: number;
  lineTotalCents: number;
}

export interface LaborLineMoney {
  lineTotalCents: number;
}

export interface QuoteTotals {
  partsSubtotalCents: number;
  laborSubtotalCents: number;
  suppliesCents: number;
  partsDiscountCents: number;
  laborDiscountCents: number;
  partsTaxCents: number;
  laborTaxCents: number;
  taxCents: number;
  totalCents: number;
  depositCents: number;
}

export interface QuoteMoney {
  parts: PartLineMoney[];
  labor: LaborLineMoney[];
  totals: QuoteTotals;
}

function nonNegativeCents(value: number | null | undefined, what: string): bigint {
  if (value === null || value === undefined) throw new MoneyInputError(`${what} is required.`);
  const cents = assertCents(value, what);
  if (cents < 0n) throw new MoneyInputError(`${what} cannot be negative.`);
  return cents;
}

function nonNegativeRate(value: number | null | undefined, what: string, max = 1000): bigint {
  if (value === null || value === undefined) throw new MoneyInputError(`${what} is required.`);
  if (value < 0 || value > max) throw new MoneyInputError(`${what} must be between 0 and ${max} percent (got ${value}).`);
  return scaledRate(value, what);
}

/** Hours to a tenth, as a count of tenths. */
export function hoursInTenths(hours: number, what = 'Hours'): bigint {
  if (!Number.isFinite(hours) || hours < 0) throw new MoneyInputError(`${what} must be zero or more (got ${hours}).`);
  const tenths = Math.round(hours * 10);
  if (Math.abs(hours * 10 - tenths) > 1e-9) throw new MoneyInputError(`${what} are quoted to a tenth of an hour (got ${hours}).`);
  return BigInt(tenths);
}

export function partLineMoney(line: PartLineInput, index = 0): PartLineMoney {
  const label = `Parts line ${index + 1}`;
  if (!Number.isSafeInteger(line.quantity) || line.quantity < 1) {
    throw new MoneyInputError(`${label}: the quantity must be a whole number of at least 1 (got ${line.quantity}).`);
  }
  const unit =
    line.pricing === 'cost-plus'
      ? markedUp(nonNegativeCents(line.unitCostCents, `${label}: the unit cost`), nonNegativeRate(line.markupPercent, `${label}: the markup`))
      : nonNegativeCents(line.unitPriceCents, `${label}: the unit price`);
  return { unitPriceCents: toNumber(unit), lineTotalCents: toNumber(unit * BigInt(line.quantity)) };
}

export function laborLineMoney(line: LaborLineInput, laborRateCents: number, index = 0): LaborLineMoney {
  const tenths = hoursInTenths(line.hours, `Labor line ${index + 1}: hours`);
  const rate = nonNegativeCents(laborRateCents, 'The shop rate');
  return { lineTotalCents: toNumber(divideRounded(tenths * rate, 10n)) };
}

/** Every figure of a quote from its lines and rates, by the published rule above. */
export function computeQuoteMoney(input: QuoteMoneyInput): QuoteMoney {
  const parts = input.parts.map((line, index) => partLineMoney(line, index));
  const labor = input.labor.map((line, index) => laborLineMoney(line, input.laborRateCents, index));
  const partsSubtotal = parts.reduce((sum, line) => sum + BigInt(line.lineTotalCents), 0n);
  const laborSubtotal = labor.reduce((sum, line) => sum + BigInt(line.lineTotalCents), 0n);

  let supplies = percentOf(laborSubtotal, nonNegativeRate(input.suppliesPercent, 'The shop supplies rate', 100));
  if (input.suppliesCapCents !== null) {
    const cap = nonNegativeCents(input.suppliesCapCents, 'The shop supplies cap');
    if (supplies > cap) supplies = cap;
  }

  let partsDiscount = 0n;
  let laborDiscount = 0n;
  if (input.discount.kind === 'percent') {
    const rate = nonNegativeRate(input.discount.percent, 'The discount', 100);
    partsDiscount = percentOf(partsSubtotal, rate);
    laborDiscount = percentOf(laborSubtotal, rate);
  } else if (input.discount.kind === 'fixed') {
    const amount = nonNegativeCents(input.discount.amountCents, 'The discount amount');
    const base = partsSubtotal + laborSubtotal;
    if (amount > base) {
      throw new MoneyInputError(`The discount (${amount} cents) is more than the parts and labor together (${base} cents).`);
    }
    partsDiscount = base === 0n ? 0n : divideRounded(amount * partsSubtotal, base);
    laborDiscount = amount - partsDiscount;
  }

  const partsTax = percentOf(partsSubtotal - partsDiscount, nonNegativeRate(input.partsTaxPercent, 'The parts tax rate', 100));
  const laborTax = percentOf(laborSubtotal - laborDiscount + supplies, nonNegativeRate(input.laborTaxPercent, 'The labor tax rate', 100));
  const tax = partsTax + laborTax;
  const total = partsSubtotal - partsDiscount + laborSubtotal - laborDiscount + supplies + tax;

  let deposit: bigint;
  if (input.deposit.kind === 'fixed') deposit = nonNegativeCents(input.deposit.amountCents, 'The deposit amount');
  else deposit = percentOf(total, nonNegativeRate(input.deposit.percent, 'The deposit rate', 100));
  if (deposit > total) deposit = total;

  return {
    parts,
    labor,
    totals: {
      partsSubtotalCents: toNumber(partsSubtotal),
      laborSubtotalCents: toNumber(laborSubtotal),
      suppliesCents: toNumber(supplies),
      partsDiscountCents: toNumber(partsDiscount),
      laborDiscountCents: toNumber(laborDiscount),
      partsTaxCents: toNumber(partsTax),
      laborTaxCents: toNumber(laborTax),
      taxCents: toNumber(tax),
      totalCents: toNumber(total),
      depositCents: toNumber(deposit),
    },
  };
}
