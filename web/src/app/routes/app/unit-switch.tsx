import { Segmented, Tooltip } from 'antd';
import { useUnits } from '@/hooks/use-units';
import { UNIT_SYSTEMS as unitSystems, type UnitSystem } from '@swapwright/shared';

export function UnitSwitch() {
  const { system, shopSystem, setOverride } = useUnits();
  return (
    <Tooltip title={`Lengths show in this unit for you. Shop default: ${shopSystem === 'in' ? 'inches' : 'millimetres'}.`}>
      <Segmented<UnitSystem>
        size="small"
        className="unit-switch"
        aria-label="Length unit"
        value={system}
        onChange={(v) => setOverride(v === shopSystem ? null : v)}
        options={unitSystems.map((unit) => ({ value: unit, label: unit }))}
      />
    </Tooltip>
  );
}
