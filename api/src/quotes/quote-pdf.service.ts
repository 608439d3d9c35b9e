import { Injectable } from '@nestjs/common';
import {
  FIT_REPORT_CAUTION,
  FIT_REPORT_SAFETY,
  formatCalendarDate,
  formatMoney,
  formatDayIn,
  QUOTE_ROUNDING_RULE_FOR_CUSTOMER,
  quoteLineTextOptions,
  quoteTotalRows,
  renderText,
  sideViewGeometry,
  textParts,
  type ChassisPoint,
  type FitReport,
  type QuoteTotals,
  type TextPartsOptions,
  type UnitSystem,
} from '@swapwright/shared';
import PDFDocument from 'pdfkit';
import type { FitReportRecord } from '../fit-reports/fit-report-record.entity';
import type { Shop } from '../shops/shop.entity';
import { firstSentence } from './first-sentence';
import type { QuoteView } from './quotes.service';

/** Source Sans 3 from @fontsource, the .woff files (pdfkit's subsetter crashes on .woff2 with accented characters). */
const FONT_DIR = require('node:path').join(require.resolve('@fontsource/source-sans-3/package.json'), '..', 'files');
const FONTS = {
  regular: `${FONT_DIR}/source-sans-3-latin-400-normal.woff`,
  semibold: `${FONT_DIR}/source-sans-3-latin-600-normal.woff`,
};

export interface QuotePdfInput {
  view: QuoteView;
  shop: Shop;
  report: FitReportRecord | null;
  /** The member's own build: a budget, without the customer's approval and deposit. */
  forMyself?: boolean;
}

/**
 * The engine's words ("drop it 8.7 mm (0.34 in)") with every figure in the shop's unit system only: the PDF goes to a
 * customer whose unit choice the server does not know, so it reads as the shop's own paperwork does.
 */
function inUnits(text: string, system: UnitSystem, options?: TextPartsOptions): string {
  return renderText(textParts(text, options), system);
}

const STATUS_WORDS: Record<string, string> = { fails: 'does not fit', tight: 'tight', unknown: 'not checked', ok: 'fits' };
const INK = '#1f2933';
const MUTED = '#52606d';
const RULE = '#cbd2d9';

/** The remedies under a shortfall as one sentence: each remedy's own closing full stop gives way to the list's separator. */
export function resolvedByLine(remedies: string[]): string {
  return `Resolved by: ${remedies.map((text) => text.trim().replace(/[.;]+$/, '')).join('; ')}.`;
}

/** The quote as a PDF: header, customer and vehicle, fit summary with a small side view, lines, totals, deposit, terms and cautions. */
@Injectable()
export class QuotePdfService {
  render(input: QuotePdfInput): Promise<Buffer> {
    const { view, shop, report, forMyself = false } = input;
    const { quote, revision, project } = view;
    const currency = revision.currency;
    const doc = new PDFDocument({ size: 'LETTER', margin: 50, info: { Title: `${forMyself ? 'Budget' : 'Quote'} Q-${String(quote.number).padStart(4, '0')}`, Author: shop.name } });
    doc.registerFont('body', FONTS.regular);
    doc.registerFont('bold', FONTS.semibold);
    const chunks: Buffer[] = [];
    doc.on('data', (chunk: Buffer) => chunks.push(chunk));
    const done = new Promise<Buffer>((resolve, reject) => {
      doc.on('end', () => resolve(Buffer.concat(chunks)));
      doc.on('error', reject);
    });
    const width = doc.page.width - 100;
    const heading = (text: string) => {
      if (doc.y > doc.page.height - 120) doc.addPage();
      doc.moveDown(0.6).font('bold').fontSize(12).fillColor(INK).text(text, 50);
      doc.moveTo(50, doc.y + 1).lineTo(50 + width, doc.y + 1).strokeColor(RULE).lineWidth(0.5).stroke();
      doc.moveDown(0.3).font('body').fontSize(10);
    };

    // Header
    doc.font('bold').fontSize(18).fillColor(INK).text(shop.name, 50, 50);
    doc.font('body').fontSize(10).fillColor(MUTED).text(forMyself ? 'Budget of your own build' : 'Engine swap quote', 50);
    const label = `${forMyself ? 'Budget' : 'Quote'} Q-${String(quote.number).padStart(4, '0')} · revision ${revision.number}`;
    doc.font('bold').fontSize(12).fillColor(INK).text(label, 50, 50, { width, align: 'right' });
    doc.font('body').fontSize(10).fillColor(MUTED);
    doc.text(`${forMyself ? 'Written' : 'Issued'} ${formatDayIn(revision.sentAt ?? revision.createdAt, shop.timeZone)}`, { width, align: 'right' });
    if (!forMyself) doc.text(`Valid until ${formatCalendarDate(revision.validUntil)}`, { width, align: 'right' });
    doc.moveDown(1.2);

    // Customer and vehicle
    const top = doc.y;
    doc.fillColor(INK).font('bold').fontSize(11).text(forMyself ? 'Builder' : 'Customer', 50, top);
    doc.font('body').fontSize(10).text(project.customer?.name ?? '—');
    if (project.customer?.email) doc.text(project.customer.email);
    if (project.customer?.phone) doc.text(project.customer.phone);
    const leftBottom = doc.y;
    doc.font('bold').fontSize(11).text('Vehicle and swap', 320, top, { width: width - 270 });
    doc.font('body').fontSize(10).text(project.title, { width: width - 270 });
    if (project.vehicleDescription) doc.fillColor(MUTED).text(project.vehicleDescription, { width: width - 270 });
    doc.y = Math.max(leftBottom, doc.y);
    doc.x = 50;

    // Fit summary
    heading(`Fit check this ${forMyself ? 'budget' : 'quote'} is built on`);
    if (!report) {
      doc
        .fillColor(MUTED)
        .text(
          forMyself
            ? 'No fit report was stored when this budget was written; the lines are your own estimate.'
            : 'No fit report was stored when this quote was written; the lines are the estimate of the shop.',
          50,
        );
    } else {
      this.fitSummary(doc, report.results, report, revision, width, shop.unitSystem, shop.timeZone);
    }

    // Lines
    heading('Parts and labor');
    this.lines(doc, view, width, shop.unitSystem);

    // Totals and deposit
    heading('Totals');
    this.totals(doc, revision.totals, currency, width);
    if (!forMyself) this.deposit(doc, revision, currency, width);

    // Terms, rounding rule, cautions
    if (!forMyself) {
      heading('Terms');
      doc.fillColor(INK).fontSize(9).text(revision.terms, 50, doc.y, { width });
    }
    heading('How the figures are rounded');
    doc.fillColor(INK).fontSize(9).text(QUOTE_ROUNDING_RULE_FOR_CUSTOMER, 50, doc.y, { width });
    heading('Planning aid and safety');
    doc.fillColor(INK).fontSize(9).text(`Planning aid: ${FIT_REPORT_CAUTION}`, 50, doc.y, { width });
    doc.moveDown(0.3);
    for (const caution of FIT_REPORT_SAFETY) doc.text(`• ${caution}`, 58, doc.y, { width: width - 8 });
    doc.end();
    return done;
  }

  private deposit(doc: PDFKit.PDFDocument, revision: QuoteView['revision'], currency: string, width: number): void {
    doc.moveDown(0.4).font('bold').fontSize(11).fillColor(INK);
    doc.text(`Deposit due on approval: ${formatMoney(revision.totals.depositCents, currency)}`, 50, doc.y, { width, align: 'right' });
    doc.font('body').fontSize(9).fillColor(MUTED);
    doc.text(
      revision.depositKind === 'percent'
        ? `The deposit is ${revision.depositPercent} % of the total, rounded to the cent, never more than the total.`
        : 'The deposit is a fixed amount, never more than the total.',
      50,
      doc.y,
      { width, align: 'right' },
    );
  }

  private fitSummary(
    doc: PDFKit.PDFDocument,
    results: FitReport,
    record: FitReportRecord,
    revision: QuoteView['revision'],
    width: number,
    units: UnitSystem,
    timeZone: string,
  ): void {
    const { summary } = results;
    const lines = revision.lines;
    const plan = revision.partsPlanVersion !== null ? ` Parts from parts plan version ${revision.partsPlanVersion}.` : '';
    doc.fillColor(MUTED).fontSize(9).text(
      `Fit report ${record.id.slice(0, 8)} of ${formatDayIn(record.createdAt, timeZone)}: ${summary.total} checks, ${summary.ok} fit, ${summary.tight} tight, ${summary.fails} do not fit, ${summary.unknown} not checked.${plan}`,
      50,
      doc.y,
      { width },
    );
    doc.moveDown(0.3);
    if (doc.y > doc.page.height - 200) doc.addPage();
    // The side view first, at the right, so it stays on the page the summary starts on.
    const viewTop = doc.y;
    const viewPage = doc.page;
    const textWidth = width - 200;
    this.sideView(doc, record, 50 + textWidth + 10, viewTop, 190, 120);
    doc.y = viewTop;
    doc.x = 50;
    if (results.shortfalls.length === 0) doc.fillColor(INK).fontSize(10).text('No shortfalls: every check that could run fits.', 50, doc.y, { width: textWidth });
    const quotedFromReport = lines.some((line) => line.source === 'fit-remedy');
    const shown = results.shortfalls.slice(0, 6);
    for (const finding of shown) {
      doc.font('bold').fontSize(9.5).fillColor(INK).text(`${finding.title} — ${STATUS_WORDS[finding.status] ?? finding.status}`, 50, doc.y, { width: textWidth });
      doc.font('body').fontSize(9).fillColor(MUTED).text(inUnits(firstSentence(finding.message), units), { width: textWidth });
      const resolved = finding.remedies
        .map((remedy) => (remedy.kind === 'fabrication' ? remedy.operation : remedy.kind === 'part' ? firstSentence(remedy.note) : null))
        .filter((text): text is string => Boolean(text));
      if (resolved.length > 0) {
        doc.fillColor(INK).text(inUnits(resolvedByLine(resolved.slice(0, 2)), units), { width: textWidth });
      }
      doc.moveDown(0.2);
    }
    if (results.shortfalls.length > shown.length) {
      doc.fillColor(MUTED).text(`…and ${results.shortfalls.length - shown.length} more in the fit report.`, 50, doc.y, { width: textWidth });
    }
    if (quotedFromReport) doc.fillColor(MUTED).text('The lines marked from the fit check below carry out these remedies.', 50, doc.y, { width: textWidth });
    if (doc.page === viewPage) doc.y = Math.max(doc.y, viewTop + 128);
    doc.x = 50;
  }

  /** A small side view of the placed engine, pan and chassis obstacles (x rearward, z up), scaled into the box. */
  private sideView(doc: PDFKit.PDFDocument, record: FitReportRecord, left: number, top: number, boxWidth: number, boxHeight: number): void {
    let geometry;
    try {
      geometry = sideViewGeometry(record.inputsSnapshot.spec, record.inputsSnapshot.settingsOverrides);
    } catch {
      return;
    }
    const { xMin, xMax, zMin, zMax } = geometry.bounds;
    const scale = Math.min(boxWidth / Math.max(1, xMax - xMin), (boxHeight - 12) / Math.max(1, zMax - zMin));
    const point = (p: ChassisPoint): [number, number] => [left + (p.x - xMin) * scale, top + boxHeight - 12 - (p.z - zMin) * scale];
    const path = (points: ChassisPoint[] | null, color: string, closed: boolean, fill = false) => {
      if (!points || points.length < 2) return;
      const [x0, y0] = point(points[0]);
      doc.moveTo(x0, y0);
      for (const p of points.slice(1)) doc.lineTo(...point(p));
      if (closed) doc.closePath();
      if (fill) doc.fillOpacity(0.25).fillAndStroke(color, color).fillOpacity(1);
      else doc.strokeColor(color).lineWidth(0.7).stroke();
    };
    doc.save();
    doc.rect(left, top, boxWidth, boxHeight).strokeColor(RULE).lineWidth(0.5).stroke();
    const [gx0, gy] = point({ x: geometry.ground.xFrom, z: geometry.ground.z });
    const [gx1] = point({ x: geometry.ground.xTo, z: geometry.ground.z });
    doc.moveTo(gx0, gy).lineTo(gx1, gy).strokeColor(MUTED).lineWidth(0.5).stroke();
    for (const obstacle of geometry.obstacles) path(obstacle.outline, '#7b8794', true, true);
    path(geometry.hoodLine, '#9aa5b1', false);
    path(geometry.topProfile, '#1f6feb', false);
    path(geometry.rearProfile, '#1f6feb', false);
    path(geometry.pan, '#1f6feb', true);
    path(geometry.transmission, '#3e4c59', true);
    for (const dimension of geometry.dimensions.filter((d) => d.short).slice(0, 3)) {
      const [x1, y1] = point(dimension.from);
      const [x2, y2] = point(dimension.to);
      doc.moveTo(x1, y1).lineTo(x2, y2).strokeColor('#c81e1e').lineWidth(1).stroke();
    }
    doc.font('body').fontSize(7).fillColor(MUTED).text('Side view (front at left); red: gaps short of the required.', left + 3, top + boxHeight - 10, { width: boxWidth - 6 });
    doc.restore();
  }

  private lines(doc: PDFKit.PDFDocument, view: QuoteView, width: number, units: UnitSystem): void {
    const { revision } = view;
    const columns = { description: 50, quantity: 50 + width - 250, unit: 50 + width - 170, total: 50 + width - 80 };
    const row = (cells: [string, string, string, string], bold = false) => {
      if (doc.y > doc.page.height - 80) doc.addPage();
      const y = doc.y;
      doc.font(bold ? 'bold' : 'body').fontSize(9).fillColor(INK);
      doc.text(cells[0], columns.description, y, { width: columns.quantity - columns.description - 10 });
      const bottom = doc.y;
      doc.text(cells[1], columns.quantity, y, { width: 70, align: 'right' });
      doc.text(cells[2], columns.unit, y, { width: 80, align: 'right' });
      doc.text(cells[3], columns.total, y, { width: 80, align: 'right' });
      doc.y = Math.max(bottom, doc.y) + 2;
    };
    row(['Description', 'Qty / hours', 'Unit', 'Amount'], true);
    for (const kind of ['part', 'labor'] as const) {
      const lines = revision.lines.filter((line) => line.kind === kind);
      if (lines.length === 0) continue;
      doc.font('bold').fontSize(9).fillColor(MUTED).text(kind === 'part' ? 'Parts' : `Labor at ${formatMoney(revision.laborRateCents, revision.currency)} per hour`, 50, doc.y + 2);
      for (const line of lines) {
        row([
          inUnits(line.source === 'fit-remedy' ? `${line.description} (from the fit check)` : line.description, units, quoteLineTextOptions(line)),
          kind === 'part' ? String(line.quantity) : `${(line.hours ?? 0).toFixed(1)} h`,
          formatMoney(line.unitPriceCents, revision.currency),
          formatMoney(line.lineTotalCents, revision.currency),
        ]);
      }
    }
  }

  private totals(doc: PDFKit.PDFDocument, totals: QuoteTotals, currency: string, width: number): void {
    for (const { label: name, cents } of quoteTotalRows(totals)) {
      const y = doc.y;
      doc.font('body').fontSize(10).fillColor(INK).text(name, 50 + width - 300, y, { width: 150 });
      doc.text(formatMoney(cents, currency), 50 + width - 150, y, { width: 150, align: 'right' });
    }
    const y = doc.y + 2;
    doc.moveTo(50 + width - 300, y).lineTo(50 + width, y).strokeColor(INK).lineWidth(0.7).stroke();
    doc.y = y + 3;
    doc.font('bold').fontSize(12).text('Total', 50 + width - 300, doc.y, { width: 150 });
    doc.text(formatMoney(totals.totalCents, currency), 50 + width - 150, doc.y - doc.currentLineHeight(), { width: 150, align: 'right' });
  }
}
