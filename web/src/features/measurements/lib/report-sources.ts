import type { ChassisInput } from '../types';

export interface CheckSources {
  checkId: string;
  title: string;
  inputs: ChassisInput[];
  fromSheet: number;
  fromCatalog: number;
  flagged: number;
}

/**
 * The report's chassis inputs grouped check by check (in the report's order of checks), each input with its source.
 * Inputs with neither a measured nor a catalog figure are left out (nothing went into the check from them).
 */
export function sourcesByCheck(inputs: readonly ChassisInput[], checks: ReadonlyArray<{ checkId: string; title: string }>): CheckSources[] {
  const used = inputs.filter((i) => i.measuredValue !== null || i.catalogValue !== null);
  const out: CheckSources[] = [];
  for (const check of checks) {
    const mine = used.filter((i) => i.checks.includes(check.checkId));
    if (mine.length === 0) continue;
    // measured first, the flagged ones at the top
    mine.sort((a, b) => Number(b.flagged) - Number(a.flagged) || Number(b.source.kind === 'sheet') - Number(a.source.kind === 'sheet'));
    out.push({
      checkId: check.checkId,
      title: check.title,
      inputs: mine,
      fromSheet: mine.filter((i) => i.source.kind === 'sheet').length,
      fromCatalog: mine.filter((i) => i.source.kind === 'catalog').length,
      flagged: mine.filter((i) => i.flagged).length,
    });
  }
  return out;
}

export function sourceTotals(inputs: readonly ChassisInput[]): { fromSheet: number; fromCatalog: number; flagged: ChassisInput[] } {
  return {
    fromSheet: inputs.filter((i) => i.source.kind === 'sheet').length,
    fromCatalog: inputs.filter((i) => i.source.kind === 'catalog' && i.catalogValue !== null).length,
    flagged: inputs.filter((i) => i.flagged),
  };
}
