import { QUOTE_ROUNDING_RULE, QUOTE_ROUNDING_RULE_FOR_CUSTOMER, type ComparableLine, type RevisionDiff } from '@swapwright/shared';
import {
  QuoteNotificationResponseDto,
  QuoteResponseDto,
  QuoteRevisionDiffLineSideDto,
  QuoteRevisionDiffResponseDto,
  QuoteRevisionResponseDto,
  QuoteSettingsResponseDto,
} from './dto/quote-response.dto';
import type { AuthUser } from '../common/tenant/auth-user';
import { isOwnProject } from '../projects/project.mapper';
import { QuoteNotification } from './quote-notification.entity';
import { QuoteRevision } from './quote-revision.entity';
import { QuoteSettings } from './quote-settings.entity';
import { quoteLabel } from './quote-label';
import { QuoteView } from './quotes.service';

/**
 * Who reads the quote: the shop's own people see how each price was made; the customer (signed in, or holding the
 * e-mailed link) sees prices only, never the shop's cost or markup.
 */
export type QuoteAudience = 'shop' | 'customer';

export function quoteAudienceOf(user: { role: string }): QuoteAudience {
  return user.role === 'customer' ? 'customer' : 'shop';
}

/** Who asks: a signed-in person, or the holder of the e-mailed link (who sees the quote as its customer). */
export type QuoteViewer = Pick<AuthUser, 'role' | 'userId'> | 'link';

export function mapQuoteRevision(revision: QuoteRevision, audience: QuoteAudience = 'shop'): QuoteRevisionResponseDto {
  return {
    number: revision.number,
    sent: revision.sentAt !== null,
    sentAt: revision.sentAt?.toISOString() ?? null,
    fitReportId: revision.fitReportId,
    partsPlanId: revision.partsPlanId,
    partsPlanVersion: revision.partsPlanVersion,
    validUntil: revision.validUntil,
    currency: revision.currency,
    laborRateCents: revision.laborRateCents,
    suppliesPercent: revision.suppliesPercent,
    suppliesCapCents: revision.suppliesCapCents,
    partsTaxPercent: revision.partsTaxPercent,
    laborTaxPercent: revision.laborTaxPercent,
    discountKind: revision.discountKind,
    discountPercent: revision.discountPercent,
    discountAmountCents: revision.discountAmountCents,
    depositKind: revision.depositKind,
    depositPercent: revision.depositPercent,
    depositAmountCents: revision.depositAmountCents,
    terms: revision.terms,
    notes: revision.notes,
    lines: revision.lines.map((line) => ({
      ...line,
      sku: line.sku ?? null,
      ...(audience === 'customer' && { unitCostCents: null, markupPercent: null }),
    })),
    totals: { ...revision.totals },
    createdAt: revision.createdAt.toISOString(),
  };
}

export function mapQuote(view: QuoteView, viewer: QuoteViewer): QuoteResponseDto {
  const { quote, project } = view;
  const audience: QuoteAudience = viewer === 'link' ? 'customer' : quoteAudienceOf(viewer);
  return {
    id: quote.id,
    projectId: project.id,
    projectTitle: project.title,
    shopName: view.shopName,
    customerName: project.customer?.name ?? null,
    customerEmail: project.customer?.email ?? null,
    forMyself: viewer !== 'link' && isOwnProject(project, viewer),
    label: quoteLabel(quote),
    status: view.status,
    latestRevision: quote.latestRevision,
    sentRevision: quote.sentRevision,
    answeredAt: quote.answeredAt?.toISOString() ?? null,
    declineReason: quote.declineReason,
    depositState: quote.depositState,
    depositPaidAt: quote.depositPaidAt?.toISOString() ?? null,
    roundingRule: audience === 'customer' ? QUOTE_ROUNDING_RULE_FOR_CUSTOMER : QUOTE_ROUNDING_RULE,
    revision: mapQuoteRevision(view.revision, audience),
    revisions: view.revisions.map((revision) => ({ number: revision.number, sentAt: revision.sentAt?.toISOString() ?? null, totalCents: revision.totals.totalCents })),
  };
}

function diffSide(line: ComparableLine): QuoteRevisionDiffLineSideDto {
  return { quantity: line.quantity, hours: line.hours, unitPriceCents: line.unitPriceCents, lineTotalCents: line.lineTotalCents };
}

export function mapRevisionDiff(diff: RevisionDiff): QuoteRevisionDiffResponseDto {
  return {
    fromNumber: diff.fromNumber,
    toNumber: diff.toNumber,
    lines: diff.lines.map((line) => ({
      change: line.change,
      key: line.key,
      kind: line.kind,
      description: line.description,
      ...(line.change === 'changed' && { fields: line.fields }),
      beforeCents: line.change === 'added' ? null : line.before.lineTotalCents,
      afterCents: line.change === 'removed' ? null : line.after.lineTotalCents,
      before: line.change === 'added' ? null : diffSide(line.before),
      after: line.change === 'removed' ? null : diffSide(line.after),
    })),
    totals: diff.totals,
  };
}

export function mapQuoteNotification(notification: QuoteNotification): QuoteNotificationResponseDto {
  return { id: notification.id, quoteId: notification.quoteId, projectId: notification.projectId, message: notification.message, createdAt: notification.createdAt.toISOString() };
}

export function mapQuoteSettings(settings: QuoteSettings): QuoteSettingsResponseDto {
  const { laborTaxPercent, suppliesCapCents, depositPercent, validityDays, defaultMarkupPercent, terms } = settings;
  return { laborTaxPercent, suppliesCapCents, depositPercent, validityDays, defaultMarkupPercent, terms };
}
