import { DataList, Group, Stack } from '@mantine/core';
import { formatDose, tallMan, type OrderDetail, type BolusResponse } from '@lockstep/shared';
import { formatDateTime } from '@/utils/format-date';
import { BackToOrdersButton } from './back-to-orders-button';
import { DonePanel } from './done-panel';

/** The recorded clinician bolus: how much, when, why, and who gave and witnessed it. */
export function BolusGiven({ order, bolus }: { order: OrderDetail; bolus: BolusResponse }) {
  return (
    <DonePanel number={3} title="Clinician bolus recorded">
      <Stack gap="md">
        <DataList labelWidth="10rem" className="tabular-nums">
          <DataList.Item>
            <DataList.ItemLabel>Bolus</DataList.ItemLabel>
            <DataList.ItemValue>
              {formatDose(bolus.amount, bolus.doseUnit)} {tallMan(order.drugName)}
            </DataList.ItemValue>
          </DataList.Item>
          <DataList.Item>
            <DataList.ItemLabel>Given at</DataList.ItemLabel>
            <DataList.ItemValue>{formatDateTime(bolus.at)}</DataList.ItemValue>
          </DataList.Item>
          <DataList.Item>
            <DataList.ItemLabel>Given by</DataList.ItemLabel>
            <DataList.ItemValue>{bolus.givenByName}</DataList.ItemValue>
          </DataList.Item>
          <DataList.Item>
            <DataList.ItemLabel>Witness</DataList.ItemLabel>
            <DataList.ItemValue>{bolus.witnessName}</DataList.ItemValue>
          </DataList.Item>
          <DataList.Item>
            <DataList.ItemLabel>Reason</DataList.ItemLabel>
            <DataList.ItemValue>{bolus.reason}</DataList.ItemValue>
          </DataList.Item>
          {bolus.overrideReason ? (
            <DataList.Item>
              <DataList.ItemLabel>Soft-limit reason</DataList.ItemLabel>
              <DataList.ItemValue>{bolus.overrideReason}</DataList.ItemValue>
            </DataList.Item>
          ) : null}
        </DataList>
        <Group>
          <BackToOrdersButton wardId={order.wardId} />
        </Group>
      </Stack>
    </DonePanel>
  );
}
