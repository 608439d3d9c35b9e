import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { CATALOG_KIND_NAMES } from '@swapwright/shared';
import { DataSource } from 'typeorm';
import { AuthUser } from '../common/tenant/auth-user';
import { CATALOG_KINDS, CatalogKind } from './catalog-kinds';
import { sampleCatalogRows, sampleRecordForShop } from './sample-catalog';

export interface SampleCatalogKindCount {
  kind: CatalogKind;
  /** Records of this kind in the sample catalog. */
  inSample: number;
  /** Of those, added to the shop's catalog by this request. */
  added: number;
}

export interface SampleCatalogCopy {
  added: number;
  alreadyThere: number;
  kinds: SampleCatalogKindCount[];
  message: string;
}

/** "3 oil pans", "1 chassis": the kind's own singular words, with an s for more than one (chassis stays chassis). */
function countOf(kind: CatalogKind, n: number): string {
  const one = CATALOG_KINDS[kind].singular;
  return `${n} ${n === 1 || one.endsWith('s') ? one : `${one}s`}`;
}

/**
 * Starts a shop's catalog from Swapwright's sample catalog (the invented demo engines, chassis and parts): every
 * sample record is copied into the caller's shop under an id fixed per shop and sample record, in one transaction.
 * A record already copied is left as the shop has it (changed or not), so pressing again adds only what is missing.
 */
@Injectable()
export class SampleCatalogService {
  constructor(@InjectDataSource() private readonly dataSource: DataSource) {}

  async copyInto(user: Pick<AuthUser, 'shopId'>): Promise<SampleCatalogCopy> {
    const kinds = await this.dataSource.transaction(async (manager) => {
      const counts: SampleCatalogKindCount[] = [];
      for (const kind of CATALOG_KIND_NAMES) {
        const definition = CATALOG_KINDS[kind];
        const rows = sampleCatalogRows(kind).map((row) => sampleRecordForShop(kind, row, user.shopId));
        const values = rows.map(({ spec, extras }) => {
          const full = { ...spec, ...definition.derive?.(spec) };
          return { id: spec.id, shopId: user.shopId, name: spec.name, spec: full, ...definition.columns(full, extras) };
        });
        // INSERT IGNORE on the primary key: a record copied before (or by a press running at the same moment) stays as it is.
        const result = await manager.createQueryBuilder().insert().into(definition.entity).values(values).orIgnore().updateEntity(false).execute();
        const affected = Number((result.raw as { affectedRows?: number }).affectedRows ?? 0);
        counts.push({ kind, inSample: rows.length, added: affected });
      }
      return counts;
    });
    const added = kinds.reduce((sum, k) => sum + k.added, 0);
    const inSample = kinds.reduce((sum, k) => sum + k.inSample, 0);
    const message =
      added === 0
        ? 'Your catalog already has every record of the sample catalog; nothing was added.'
        : `Added ${added} sample record${added === 1 ? '' : 's'} to your catalog: ${kinds
            .filter((k) => k.added > 0)
            .map((k) => countOf(k.kind, k.added))
            .join(', ')}. They are invented examples: check their figures against your own parts before you rely on them.`;
    return { added, alreadyThere: inSample - added, kinds, message };
  }
}
