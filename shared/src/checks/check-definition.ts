import type { CheckGroup, CheckStatus, Finding, FigureUnit, Remedy } from '../types/finding';
import type { FitSpec } from '../types/fit-spec';
import type { FitSettings } from '../settings/fit-settings';

export interface CheckContext {
  spec: FitSpec;
  settings: FitSettings;
}

export interface CheckDefinition {
  id: string;
  group: CheckGroup;
  title: string;
  /** True when the result depends on the engine's placement (setback, height, tilt). */
  dependsOnPlacement: boolean;
  run(context: CheckContext): Finding;
}

/** Status of a figure against a limit: fails past it, tight within `tightBand` inside it. */
export function statusFromMargin(margin: number, tightBand: number): CheckStatus {
  if (margin < 0) return 'fails';
  if (margin < tightBand) return 'tight';
  return 'ok';
}

export interface FindingFields {
  checkId: string;
  group: CheckGroup;
  title: string;
  unit: FigureUnit;
  thresholdSource: string;
  limit?: Finding['limit'];
  against?: string;
}

export function unknownFinding(fields: FindingFields, missing: string[], message?: string): Finding {
  return {
    limit: 'min',
    ...fields,
    status: 'unknown',
    measured: null,
    required: null,
    margin: null,
    message: message ?? `Cannot check ${fields.title.toLowerCase()}: missing ${missing.join(', ')}.`,
    missing,
    remedies: [],
  };
}

export function measuredFinding(
  fields: FindingFields,
  figures: { measured: number; required: number; margin: number; status: CheckStatus },
  message: string,
  remedies: Remedy[] = [],
): Finding {
  return {
    limit: 'min',
    ...fields,
    ...figures,
    message,
    missing: [],
    remedies: figures.status === 'ok' ? [] : remedies,
  };
}
