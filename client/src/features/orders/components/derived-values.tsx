import { DataList } from '@mantine/core';
import { formatDose, type DoseUnit, type OrderDerivedValues } from '@lockstep/shared';

export interface DerivedValuesProps {
  derived: OrderDerivedValues;
  doseUnit: DoseUnit;
}

/** What the regimen means at the pump and at most: volumes, demands per hour, 1- and 4-hour maxima. */
export function DerivedValues({ derived, doseUnit }: DerivedValuesProps) {
  const rows: [string, string][] = [
    ['Volume per demand', formatDose(derived.demandDoseMl, 'mL')],
    ['Basal rate', formatDose(derived.basalRateMlPerHour, 'mL/h')],
    ['Most demands per hour', formatDose(derived.maxDemandsPerHour, '')],
    ['Most in any hour', formatDose(derived.maxHourlyDose, doseUnit)],
    ['Most in any 4 hours', formatDose(derived.maxFourHourDose, doseUnit)],
  ];
  return (
    <DataList labelWidth="11rem" className="tabular-nums" aria-label="Derived values">
      {rows.map(([label, value]) => (
        <DataList.Item key={label}>
          <DataList.ItemLabel>{label}</DataList.ItemLabel>
          <DataList.ItemValue fw={600}>{value}</DataList.ItemValue>
        </DataList.Item>
      ))}
    </DataList>
  );
}
