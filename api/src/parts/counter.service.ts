import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { COUNTER_STATUS_LABELS, counterLineStateWords, SET_ASIDE_STATUSES, type CounterStatus } from '@swapwright/shared';
import Papa from 'papaparse';
import { randomUUID } from 'node:crypto';
import { DataSource, EntityManager, In } from 'typeorm';
import { AuditService } from '../audit/audit.service';
import { AuthUser } from '../common/tenant/auth-user';
import { escapeFormula } from './csv-cells';
import { mapCounterLine } from './parts-plan.mapper';
import { WorkOrder } from '../work-orders/work-order.entity';
import { CounterLine, PartStock } from './part.entity';
import { PartsErrors } from './parts.errors';
import { PartsPlansService } from './parts-plans.service';

/** A part of an accepted quote revision that the shop's catalog holds. */
export interface AcceptedPart {
  partId: string;
  sku: string;
  description: string;
  quantity: number;
}

export interface AcceptedQuoteParts {
  shopId: string;
  projectId: string;
  /** The plan the revision was drawn from; without one there is no counter list to match. */
  planId: string | null;
  quoteLabel: string;
  parts: AcceptedPart[];
  /** Every part line of the revision is a part of the shop's list (none written by hand). */
  everyPartLinked: boolean;
}

export interface CounterLineView {
  line: CounterLine;
  stock: PartStock[];
}

const NEXT: Record<'to-order' | 'ordered', CounterStatus[]> = {
  'to-order': ['open'],
  ordered: ['open', 'to-order'],
};

/** The counter's side of a plan: stock on hand and bins per line, reservations under row locks, orders. */
@Injectable()
export class CounterService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly plans: PartsPlansService,
    private readonly audit: AuditService,
  ) {}

  async lines(user: Pick<AuthUser, 'shopId'>, planId: string): Promise<CounterLineView[]> {
    const plan = await this.plans.get(user, planId);
    const lines = await this.dataSource.getRepository(CounterLine).find({ where: { shopId: user.shopId, planId: plan.id }, order: { sku: 'ASC' } });
    const partIds = lines.map((l) => l.partId).filter((id): id is string => !!id);
    const stock = partIds.length > 0 ? await this.dataSource.getRepository(PartStock).find({ where: { shopId: user.shopId, partId: In(partIds) }, order: { location: 'ASC' } }) : [];
    return lines.map((line) => ({ line, stock: stock.filter((s) => s.partId === line.partId) }));
  }

  /**
   * Brings the counter's list of the quote's plan in line with the parts of the accepted revision, in the transaction
   * that opens its work order: a part the estimator added to the quote gets a line, a changed quantity gets the
   * difference as an open line (or takes units off an open line), and an open line of a part the quote dropped goes
   * (only when every part line of the quote is one of the shop's parts).
   * Units already set aside, ordered or issued are left for the counter to release by hand.
   */
  async matchAcceptedQuote(manager: EntityManager, accepted: AcceptedQuoteParts): Promise<void> {
    const { shopId, projectId, planId, quoteLabel, parts } = accepted;
    if (!planId) return;
    const lines = await manager.getRepository(CounterLine).createQueryBuilder('l').setLock('pessimistic_write').where('l.planId = :planId AND l.shopId = :shopId', { planId, shopId }).orderBy('l.id', 'ASC').getMany();
    const wanted = new Map<string, AcceptedPart>();
    for (const part of parts) {
      const seen = wanted.get(part.partId);
      wanted.set(part.partId, seen ? { ...seen, quantity: seen.quantity + part.quantity } : { ...part });
    }
    const changes: string[] = [];
    const added: CounterLine[] = [];
    const reduced: { line: CounterLine; keep: number }[] = [];
    for (const part of wanted.values()) {
      const ofPart = lines.filter((line) => line.partId === part.partId);
      let difference = part.quantity - ofPart.reduce((sum, line) => sum + line.quantity, 0);
      if (difference > 0) {
        added.push(manager.create(CounterLine, { id: randomUUID(), shopId, planId, projectId, partId: part.partId, sku: part.sku, description: part.description.slice(0, 240), quantity: difference, status: 'open', stockId: null, updatedById: null }));
        changes.push(`${part.sku} +${difference}`);
        continue;
      }
      for (const line of ofPart) {
        if (difference >= 0) break;
        if (line.status !== 'open') continue;
        const keep = Math.max(0, line.quantity + difference);
        difference += line.quantity - keep;
        reduced.push({ line, keep });
        changes.push(`${line.sku} −${line.quantity - keep}`);
      }
    }
    // A part line written by hand may stand for a planned part, so with one on the quote no planned line is dropped.
    for (const line of accepted.everyPartLinked ? lines : []) {
      if (line.status !== 'open' || (line.partId && wanted.has(line.partId))) continue;
      reduced.push({ line, keep: 0 });
      changes.push(`${line.sku} −${line.quantity} (not in the quote)`);
    }
    if (changes.length === 0) return;
    await this.audit.record(manager, {
      shopId,
      actor: { userId: null, name: 'Quote acceptance' },
      kind: 'stock',
      action: 'counter.matched-to-quote',
      subjectId: planId,
      summary: `Counter list matched to the accepted quote ${quoteLabel}: ${changes.join(', ')}.`,
      before: { lines: lines.map((line) => `${line.sku} ×${line.quantity} (${COUNTER_STATUS_LABELS[line.status]})`) },
      after: { changes },
    });
    for (const { line, keep } of reduced) {
      if (keep === 0) await manager.delete(CounterLine, { id: line.id, shopId });
      else await manager.update(CounterLine, { id: line.id, shopId }, { quantity: keep });
    }
    if (added.length > 0) await manager.insert(CounterLine, added);
  }

  private async lockedLine(manager: EntityManager, user: Pick<AuthUser, 'shopId'>, id: string): Promise<CounterLine> {
    const line = await manager.getRepository(CounterLine).createQueryBuilder('l').setLock('pessimistic_write').where('l.id = :id AND l.shopId = :shopId', { id, shopId: user.shopId }).getOne();
    if (!line) throw PartsErrors.lineNotFound();
    return line;
  }

  /**
   * Sets the line's units aside from one location. The line and the part's stock rows are locked
   * (SELECT ... FOR UPDATE) for the transaction, so two clerks reserving the last unit get one success and one 409.
   */
  async reserve(user: AuthUser, id: string, location?: string): Promise<CounterLineView> {
    await this.dataSource.transaction(async (manager) => {
      const line = await this.lockedLine(manager, user, id);
      if (line.status !== 'open' && line.status !== 'to-order' && line.status !== 'ordered') throw PartsErrors.lineState(line.sku, line.status, 'reserved');
      if (!line.partId) throw PartsErrors.partNotFound();
      const rows = await manager
        .getRepository(PartStock)
        .createQueryBuilder('s')
        .setLock('pessimistic_write')
        .where('s.partId = :partId AND s.shopId = :shopId', { partId: line.partId, shopId: user.shopId })
        .orderBy('s.id', 'ASC') // stock rows are locked in id order everywhere
        .getMany();
      const usable = rows.filter((row) => !location || row.location === location);
      // the most free units first; between equals, the first location by name
      const best = usable.sort((a, b) => b.onHand - b.reserved - (a.onHand - a.reserved) || a.location.localeCompare(b.location))[0];
      const free = best ? best.onHand - best.reserved : 0;
      if (!best || free < line.quantity) throw PartsErrors.outOfStock(line.sku, free, line.quantity);
      await this.moveUnits(manager, user, line, best, {
        action: 'stock.reserved',
        summary: `${line.quantity} × ${line.sku} reserved at ${best.location}.`,
        reserved: line.quantity,
        line: { status: 'reserved', stockId: best.id },
      });
    });
    return this.view(user, id);
  }

  async release(user: AuthUser, id: string): Promise<CounterLineView> {
    await this.dataSource.transaction(async (manager) => {
      const line = await this.lockedLine(manager, user, id);
      if (line.status === 'issued') throw PartsErrors.lineIssued(line.sku);
      if ((line.status !== 'reserved' && line.status !== 'received') || !line.stockId) throw PartsErrors.lineState(line.sku, line.status, 'released');
      const [stock] = await this.lockedStock(manager, user.shopId, [line.stockId]);
      await this.moveUnits(manager, user, line, stock ?? null, {
        action: 'stock.released',
        summary: `${line.quantity} × ${line.sku} released${stock ? ` at ${stock.location}` : ''}.`,
        reserved: -line.quantity,
        line: { status: 'open', stockId: null },
      });
    });
    return this.view(user, id);
  }

  async mark(user: AuthUser, id: string, status: 'to-order' | 'ordered'): Promise<CounterLineView> {
    await this.dataSource.transaction(async (manager) => {
      const line = await this.lockedLine(manager, user, id);
      if (!NEXT[status].includes(line.status)) throw PartsErrors.lineState(line.sku, line.status, `marked ${status}`);
      await manager.update(CounterLine, { id: line.id }, { status, updatedById: user.userId });
    });
    return this.view(user, id);
  }

  /** The ordered units arrived: they go on hand at the location and are set aside for this job at once. */
  async receive(user: AuthUser, id: string, location: string, bin?: string): Promise<CounterLineView> {
    await this.dataSource.transaction(async (manager) => {
      const line = await this.lockedLine(manager, user, id);
      if (line.status !== 'ordered' && line.status !== 'to-order') throw PartsErrors.lineState(line.sku, line.status, 'received');
      if (!line.partId) throw PartsErrors.partNotFound();
      const stock = await manager
        .getRepository(PartStock)
        .createQueryBuilder('s')
        .setLock('pessimistic_write')
        .where('s.partId = :partId AND s.location = :location', { partId: line.partId, location })
        .getOne();
      await this.audit.record(manager, {
        shopId: user.shopId,
        actor: user,
        kind: 'stock',
        action: 'stock.received',
        subjectId: line.id,
        summary: `${line.quantity} × ${line.sku} received at ${location} and set aside for the job.`,
        before: { status: line.status, location, onHand: stock?.onHand ?? 0, reserved: stock?.reserved ?? 0 },
        after: { status: 'received', location, onHand: (stock?.onHand ?? 0) + line.quantity, reserved: (stock?.reserved ?? 0) + line.quantity },
      });
      let stockId = stock?.id;
      if (stock) {
        await manager.update(PartStock, { id: stock.id }, { onHand: stock.onHand + line.quantity, reserved: stock.reserved + line.quantity, ...(bin && { bin }) });
      } else {
        stockId = randomUUID();
        await manager.insert(PartStock, { id: stockId, shopId: user.shopId, partId: line.partId, location, bin: bin ?? '', onHand: line.quantity, reserved: line.quantity });
      }
      await manager.update(CounterLine, { id: line.id }, { status: 'received', stockId, updatedById: user.userId });
    });
    return this.view(user, id);
  }

  /**
   * The fabricator takes the line's set-aside units to the bay: they leave the shelf (on hand and set aside both go
   * down) and the line reads issued. The line, then its stock row, are locked as a reservation locks them.
   */
  async issue(user: AuthUser, id: string): Promise<CounterLineView> {
    await this.dataSource.transaction(async (manager) => {
      const line = await this.lockedLine(manager, user, id);
      if (line.status === 'issued') throw PartsErrors.lineState(line.sku, 'already issued to the job', 'issued again');
      if (!SET_ASIDE_STATUSES.includes(line.status)) throw PartsErrors.notSetAside(line.sku, line.status);
      await this.assertJobInProgress(manager, user.shopId, line.projectId);
      await this.issueLocked(manager, user, [line]);
    });
    return this.view(user, id);
  }

  /** Issues every set-aside line of a plan at once (the whole pick list goes to the bay); 409 when none is set aside. */
  async issuePlan(user: AuthUser, planId: string): Promise<CounterLineView[]> {
    const plan = await this.plans.get(user, planId);
    await this.dataSource.transaction(async (manager) => {
      const lines = await this.lockedSetAside(manager, user.shopId, { planId: plan.id });
      if (lines.length === 0) throw PartsErrors.nothingToIssue();
      await this.assertJobInProgress(manager, user.shopId, plan.projectId);
      await this.issueLocked(manager, user, lines);
    });
    return this.lines(user, planId);
  }

  /**
   * The work order is finished: whatever is still set aside for its project is issued to it, inside the finishing
   * transaction (`manager`), with an audit entry per line. Returns how many lines were issued.
   */
  async issueRestOfJob(manager: EntityManager, user: AuthUser, projectId: string): Promise<number> {
    const lines = await this.lockedSetAside(manager, user.shopId, { projectId });
    await this.issueLocked(manager, user, lines);
    return lines.length;
  }

  /** An issued part came back unused: it goes on hand again where it was taken from, and the line is open once more. */
  async returnToShelf(user: AuthUser, id: string): Promise<CounterLineView> {
    await this.dataSource.transaction(async (manager) => {
      const line = await this.lockedLine(manager, user, id);
      if (line.status !== 'issued') throw PartsErrors.notIssued(line.sku, line.status);
      const [stock] = line.stockId ? await this.lockedStock(manager, user.shopId, [line.stockId]) : [];
      if (!stock) throw PartsErrors.noStockLocation(line.sku);
      await this.moveUnits(manager, user, line, stock, {
        action: 'stock.returned',
        summary: `${line.quantity} × ${line.sku} returned to the shelf at ${stock.location}.`,
        onHand: line.quantity,
        line: { status: 'open', stockId: null, issuedAt: null },
      });
    });
    return this.view(user, id);
  }

  /** Set-aside lines locked in id order (every issuer takes them in the same order); their stock rows come after. */
  private async lockedSetAside(manager: EntityManager, shopId: string, where: { planId: string } | { projectId: string }): Promise<CounterLine[]> {
    const [column, value] = 'planId' in where ? ['planId', where.planId] : ['projectId', where.projectId];
    return manager
      .getRepository(CounterLine)
      .createQueryBuilder('l')
      .setLock('pessimistic_write')
      .where(`l.shopId = :shopId AND l.${column} = :value AND l.status IN (:...statuses)`, { shopId, value, statuses: SET_ASIDE_STATUSES })
      .orderBy('l.id', 'ASC')
      .getMany();
  }

  /** Stock rows locked in id order, as every counter action locks them: always after the line(s), never before. */
  private async lockedStock(manager: EntityManager, shopId: string, stockIds: string[]): Promise<PartStock[]> {
    if (stockIds.length === 0) return [];
    return manager
      .getRepository(PartStock)
      .createQueryBuilder('s')
      .setLock('pessimistic_write')
      .where('s.id IN (:...ids) AND s.shopId = :shopId', { ids: stockIds, shopId })
      .orderBy('s.id', 'ASC')
      .getMany();
  }

  /** Parts go to a job whose work order is open (ready or in the bay); before the deposit or after the finish, 409. */
  private async assertJobInProgress(manager: EntityManager, shopId: string, projectId: string): Promise<void> {
    const open = await manager.getRepository(WorkOrder).count({ where: { shopId, projectId, state: In(['ready', 'in-the-bay']) } });
    if (open === 0) throw PartsErrors.noWorkOrder();
  }

  /** Takes locked set-aside lines' units off the shelf: on hand and set aside both drop by each line's quantity. */
  private async issueLocked(manager: EntityManager, user: AuthUser, lines: CounterLine[]): Promise<void> {
    const ids = [...new Set(lines.flatMap((line) => (line.stockId ? [line.stockId] : [])))];
    const stocks = new Map((await this.lockedStock(manager, user.shopId, ids)).map((row) => [row.id, row]));
    for (const line of lines) {
      const stock = (line.stockId && stocks.get(line.stockId)) || null;
      await this.moveUnits(manager, user, line, stock, {
        action: 'stock.issued',
        summary: `${line.quantity} × ${line.sku} issued to the job${stock ? ` from ${stock.location}` : ''}.`,
        onHand: -line.quantity,
        reserved: -line.quantity,
        line: { status: 'issued', issuedAt: new Date() },
      });
    }
  }

  /**
   * One move of a locked line's units, in the caller's transaction: the audit entry (the line's state and the stock
   * row before and after), the stock row's new counts (`onHand` and `reserved` are changes, never below 0), the line's
   * new state. The stock row object is left holding its new counts, for a next move of the same transaction.
   */
  private async moveUnits(
    manager: EntityManager,
    user: AuthUser,
    line: CounterLine,
    stock: PartStock | null,
    move: { action: string; summary: string; onHand?: number; reserved?: number; line: Partial<CounterLine> & { status: CounterStatus } },
  ): Promise<void> {
    const after = stock && { onHand: Math.max(0, stock.onHand + (move.onHand ?? 0)), reserved: Math.max(0, stock.reserved + (move.reserved ?? 0)) };
    await this.audit.record(manager, {
      shopId: user.shopId,
      actor: user,
      kind: 'stock',
      action: move.action,
      subjectId: line.id,
      summary: move.summary,
      before: { status: line.status, ...(stock && { location: stock.location, onHand: stock.onHand, reserved: stock.reserved }) },
      after: { status: move.line.status, ...(stock && after && { location: stock.location, ...after }) },
    });
    if (stock && after) {
      await manager.update(PartStock, { id: stock.id }, after);
      Object.assign(stock, after);
    }
    await manager.update(CounterLine, { id: line.id }, { ...move.line, updatedById: user.userId });
  }

  async view(user: Pick<AuthUser, 'shopId'>, id: string): Promise<CounterLineView> {
    const line = await this.dataSource.getRepository(CounterLine).findOne({ where: { id, shopId: user.shopId } });
    if (!line) throw PartsErrors.lineNotFound();
    const stock = line.partId ? await this.dataSource.getRepository(PartStock).find({ where: { shopId: user.shopId, partId: line.partId }, order: { location: 'ASC' } }) : [];
    return { line, stock };
  }

  /**
   * The pick list as CSV: where each line's units are (the reserved location first) and its state in the counter
   * screen's own words ("To order", "Short by 2"), formula-looking cells escaped.
   */
  async pickListCsv(user: Pick<AuthUser, 'shopId'>, planId: string): Promise<string> {
    const views = await this.lines(user, planId);
    // the line as the counter screen gets it, so the words are the screen's from the same figures
    const rows = views.map(mapCounterLine).map((line) => {
      const from = line.stock.find((s) => s.id === line.stockId) ?? line.stock[0];
      return [line.sku, line.description, line.quantity, from?.location ?? '', from?.bin ?? '', counterLineStateWords(line)].map(escapeFormula);
    });
    return Papa.unparse({ fields: ['sku', 'description', 'quantity', 'location', 'bin', 'status'], data: rows });
  }
}
