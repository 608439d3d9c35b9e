import type { Placement, PlacementRemedy } from '@swapwright/shared';
import { useDeferredValue, useEffect, useMemo, useState } from 'react';
import { samePlacement } from '../components/placement-controls';
import { fitWindowFor, previewFitCheck, proposalFor, withPlacement } from '../lib/fit-engine';
import type { StoredFitReport } from '../types';

/**
 * A stored report and a placement the person is trying out: the fit engine runs here in the browser on the report's
 * inputs at the tried placement, and the fit window is searched around the stored placement at the tried tilt.
 */
export function usePlacementPreview(stored: StoredFitReport | undefined) {
  const [preview, setPreview] = useState<Placement | null>(null);
  const spec = stored?.inputs.spec;
  /** The thresholds the stored run used (defaults plus the shop's overrides). */
  const settings = stored?.report.settings;
  const storedPlacement = stored?.report.placement ?? null;
  const placement = preview ?? storedPlacement;
  const isPreview = Boolean(preview && storedPlacement && !samePlacement(preview, storedPlacement));

  useEffect(() => setPreview(null), [stored?.id]);

  const shown = useMemo(() => {
    if (!stored || !spec) return null;
    if (!isPreview || !preview) return stored.report;
    try {
      return previewFitCheck(spec, preview, settings);
    } catch {
      return stored.report;
    }
  }, [stored, spec, isPreview, preview, settings]);

  const tilt = useDeferredValue(placement?.tiltDeg ?? 0);
  const fitWindow = useMemo(() => {
    if (!spec || !storedPlacement) return null;
    try {
      return fitWindowFor(spec, storedPlacement.setbackMm, tilt, settings);
    } catch {
      return null;
    }
  }, [spec, storedPlacement, tilt, settings]);

  /** The best placement over a range of tilts, and what bounds it; searched once per stored report. */
  const proposal = useMemo(() => {
    if (!spec) return null;
    try {
      return proposalFor(spec, settings);
    } catch {
      return null;
    }
  }, [spec, settings]);

  const shownSpec = useMemo(() => (spec && placement ? withPlacement(spec, placement) : undefined), [spec, placement]);

  /** Moves the tried placement by a remedy's change. */
  const tryRemedy = (r: PlacementRemedy) => {
    if (!placement) return;
    const next = { ...placement };
    if (r.axis === 'height') next.heightMm += r.changeBy;
    else if (r.axis === 'setback') next.setbackMm += r.changeBy;
    else next.tiltDeg += r.changeBy;
    setPreview(next);
  };

  return { spec, storedPlacement, placement, isPreview, shown, fitWindow, proposal, shownSpec, setPreview, tryRemedy, reset: () => setPreview(null) };
}
