import { Segmented, Tooltip } from 'antd';
import { useUnits } from '@/hooks/use-units';
import { unitSystems, type UnitSystem } from '@/types/api';

export function UnitSwitch() {
  const { system, shopSystem, setOverride } = useUnits();
  return (
    <Tooltip title={`Lengths show in this unit for you. Shop default: ${shopSystem === 'in' ? 'inches' : 'millimetres'}.`}>
      <Segmented<UnitSystem>
        size="small"
        aria-label="Length unit"
        value={system}
        onChange={(v) => setOverride(v === shopSystem ? null : v)}
        options={unitSystems.map((unit) => ({ value: unit, label: unit }))}
      />
    </Tooltip>
  );
}
