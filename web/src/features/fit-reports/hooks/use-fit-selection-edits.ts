import { pickupForNewPan, type FitSpec, type OilPanSpec, type OilPickupSpec, type PartRemedy } from '@swapwright/shared';
import { useState } from 'react';
import { notifySuccess } from '@/lib/notifier';
import { useUpdateFitSelections } from '../api/update-fit-selections';
import { selectionKeyFor } from '../lib/remedies';
import type { FitSelections, FitSelectionsInput } from '../types';

export type FitSelectionEditsOptions = {
  projectId: string;
  selections: FitSelections | undefined;
  /** The stored report's spec: its chosen parts and candidates. */
  spec: FitSpec | undefined;
  /** Pans and pickups of the shop's catalog, besides the spec's candidates. */
  catalogPans: readonly OilPanSpec[];
  catalogPickups: readonly OilPickupSpec[];
  partName: (id: string) => string | undefined;
  onSaved?: () => void;
};

/** Changes to the project's fit selections: one slot at a time, or a part a remedy suggests (with the pickup its pan needs). */
export function useFitSelectionEdits({ projectId, selections, spec, catalogPans, catalogPickups, partName, onSaved }: FitSelectionEditsOptions) {
  const update = useUpdateFitSelections({ onSuccess: () => onSaved?.() });
  const [busyPartId, setBusyPartId] = useState<string | null>(null);

  /** Sends only the fields that change; the server merges them, so two quick edits of different fields both stay. */
  const save = async (changes: FitSelectionsInput) => {
    await update.mutateAsync({ projectId, changes });
  };

  const choosePart = async (remedy: PartRemedy, partId: string) => {
    const key = selectionKeyFor[remedy.category];
    if (!key) return;
    const patch: FitSelectionsInput = { [key]: partId };
    let extra = '';
    if (key === 'oilPanId') {
      const pan = spec?.candidates?.oilPans?.find((x) => x.id === partId) ?? catalogPans.find((x) => x.id === partId);
      const pickups = [...(spec?.candidates?.oilPickups ?? []), ...catalogPickups];
      const current = pickups.find((x) => x.id === selections?.oilPickupId) ?? spec?.oilPickup;
      const choice = pan ? pickupForNewPan(pan, current, pickups) : null;
      if (choice?.action === 'change') {
        patch.oilPickupId = choice.pickup.id;
        extra = ` with the matching pickup ${choice.pickup.name}`;
      }
    }
    setBusyPartId(partId);
    try {
      await save(patch);
      notifySuccess({ title: `Now using ${partName(partId) ?? 'the part'}${extra}`, description: 'Run the fit check again to see the change.' });
    } finally {
      setBusyPartId(null);
    }
  };

  return { save, choosePart, busyPartId, saving: update.isPending };
}
