import type { UnitSystem } from '@swapwright/shared';
import { renderFigures } from '@/lib/units';
import type { MeasurementSheet } from '../types';

/**
 * The sheet with each point's name and how-to in the person's units: the template writes them in millimetres
 * ("Frame rails: inside width 300 mm behind the front axle line"), a person in inch mode reads inches. Every
 * screen that shows a point (its card, its drawing's name, the list still to measure) takes its words from here.
 */
export function sheetInUnits(sheet: MeasurementSheet, system: UnitSystem): MeasurementSheet {
  return {
    ...sheet,
    points: sheet.points.map((point) => ({ ...point, label: renderFigures(point.label, system), howTo: renderFigures(point.howTo, system) })),
  };
}
