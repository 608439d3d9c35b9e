import { formatMoney, moneySign } from '@swapwright/shared';
import { paths, toProjectDetail, toProjectFit, toProjectMeasurements, toQuote } from '@/config/paths';
import type { Quote } from './types';

/** One thing still open before a builder freezes their budget: a plain sentence and where it can be fixed. */
export interface OwnBuildOpenItem {
  key: 'labor-rate' | 'zero-priced-parts' | 'unmatched-needs' | 'fit-not-run' | 'fit-unchecked' | 'fit-fails' | 'not-measured' | 'measurements-missing';
  sentence: string;
  link: { to: string; label: string };
  /**
   * False for a note that needs no action: labor counted at $0 per hour is the builder's own time, fine on their own
   * truck. Only open items turn the confirmation's button into "Start anyway".
   */
  open: boolean;
}

/** What the page could read about the project; `undefined` where it could not be read (that fact is left out). */
export interface OwnBuildFacts {
  quote: Pick<Quote, 'id' | 'projectId' | 'revision'>;
  /** The project's newest fit report; `null` when none was ever run. */
  fitReport?: { counts: { unknown: number; fails: number } } | null;
  /** The parts plan the revision was drafted from; `null` when it names none. */
  partsPlan?: { result: { unresolved: { title: string }[] } } | null;
  /** The project's measurement sheet. */
  sheet?: { values: unknown[]; missing: string[] };
}

const plural = (count: number, one: string, many = `${one}s`) => `${count} ${count === 1 ? one : many}`;

/** A line's description as a short name in a sentence: no closing full stop, cut at 40 characters. */
function shortName(description: string, max = 40): string {
  const name = description.trim().replace(/[.;,]+$/, '');
  return name.length > max ? `${name.slice(0, max - 1).trimEnd()}…` : name;
}

/** "a, b, c and 3 more" */
function someOf(names: string[], shown = 3): string {
  const listed = names.slice(0, shown).map((name) => shortName(name));
  const rest = names.length - listed.length;
  if (rest > 0) return `${listed.join(', ')} and ${rest} more`;
  if (listed.length <= 1) return listed.join('');
  return `${listed.slice(0, -1).join(', ')} and ${listed[listed.length - 1]}`;
}

/** The hours of the revision's labor lines, to a tenth. */
export function laborHours(revision: Quote['revision']): number {
  const hours = revision.lines.reduce((sum, line) => sum + (line.kind === 'labor' ? (line.hours ?? 0) : 0), 0);
  return Math.round(hours * 10) / 10;
}

/**
 * The $0 labor note of a builder's budget: "Labor is counted at $0 per hour: 18.5 h of your own time." Null when the
 * revision has a labor rate.
 */
export function ownTimeLaborSentence(revision: Quote['revision']): string | null {
  if (revision.laborRateCents > 0) return null;
  return `Labor is counted at ${moneySign(revision.currency)}0 per hour: ${laborHours(revision)} h of your own time.`;
}

export const PAID_HELP_LINK = { to: paths.shopSettings, label: 'To budget paid help, set a labor rate in shop settings' };

/** Everything still open on a builder's budget, in the order they would work through it. */
export function ownBuildOpenItems({ quote, fitReport, partsPlan, sheet }: OwnBuildFacts): OwnBuildOpenItem[] {
  const items: OwnBuildOpenItem[] = [];
  const { revision } = quote;
  const labor = ownTimeLaborSentence(revision);
  if (labor) items.push({ key: 'labor-rate', sentence: labor, link: PAID_HELP_LINK, open: false });

  const zeroParts = revision.lines.filter((line) => line.kind === 'part' && line.unitPriceCents === 0);
  if (zeroParts.length > 0) {
    items.push({
      key: 'zero-priced-parts',
      sentence: `${plural(zeroParts.length, 'part line is', 'part lines are')} priced at ${formatMoney(0, revision.currency)}: ${someOf(zeroParts.map((line) => line.description))}.`,
      link: { to: toQuote(quote.id), label: 'Price them in the budget lines' },
      open: true,
    });
  }

  const unresolved = partsPlan?.result.unresolved ?? [];
  if (unresolved.length > 0) {
    items.push({
      key: 'unmatched-needs',
      sentence: `The parts plan could not match parts for ${plural(unresolved.length, 'need')}: ${someOf(unresolved.map((need) => need.title))}.`,
      link: { to: toProjectDetail(quote.projectId), label: 'Open the parts plan' },
      open: true,
    });
  }

  const fit = { to: toProjectFit(quote.projectId), label: 'Open the fit check' };
  if (fitReport === null) {
    items.push({ key: 'fit-not-run', sentence: 'No fit check has been run on this truck yet.', link: { ...fit, label: 'Run the fit check' }, open: true });
  } else if (fitReport) {
    const { unknown, fails } = fitReport.counts;
    if (unknown > 0) {
      items.push({
        key: 'fit-unchecked',
        sentence: `${plural(unknown, 'fit check')} could not run: ${unknown === 1 ? 'it needs' : 'they need'} measurements or other input.`,
        link: fit,
        open: true,
      });
    }
    if (fails > 0) {
      items.push({ key: 'fit-fails', sentence: `${plural(fails, 'fit check')} still ${fails === 1 ? 'does' : 'do'} not fit.`, link: fit, open: true });
    }
  }

  if (sheet) {
    const measure = { to: toProjectMeasurements(quote.projectId), label: 'Measure the chassis' };
    if (sheet.values.length === 0) {
      items.push({ key: 'not-measured', sentence: 'The chassis has not been measured: the fit rests on catalog figures only.', link: measure, open: true });
    } else if (sheet.missing.length > 0) {
      items.push({
        key: 'measurements-missing',
        sentence: `${plural(sheet.missing.length, 'required chassis measurement is', 'required chassis measurements are')} still missing.`,
        link: measure,
        open: true,
      });
    }
  }
  return items;
}
