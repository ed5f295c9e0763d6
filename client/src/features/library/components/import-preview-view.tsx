import { Alert, Stack, Tabs, Text } from '@mantine/core';
import { IconCircleCheck } from '@tabler/icons-react';
import type { ImportPreview } from '@lockstep/shared';
import { LibraryDiffView } from './library-diff-view';
import { RulesTable } from './rules-table';

/** A checked file: its rules and what it would change, before anything is written. */
export function ImportPreviewView({ fileName, preview }: { fileName: string; preview: ImportPreview }) {
  const count = preview.rules.length;
  return (
    <Stack gap="sm">
      <Alert color="green" variant="light" icon={<IconCircleCheck aria-hidden />} title={`${fileName} is ready to import`}>
        <Text size="sm">
          {count} {count === 1 ? 'rule' : 'rules'} read without problems. Nothing is saved until you create the draft.
        </Text>
      </Alert>
      <Tabs defaultValue="changes" keepMounted={false}>
        <Tabs.List>
          <Tabs.Tab value="changes">Changes from active</Tabs.Tab>
          <Tabs.Tab value="rules">Rules in the file ({count})</Tabs.Tab>
        </Tabs.List>
        <Tabs.Panel value="changes" pt="sm">
          <LibraryDiffView diff={preview.diff} rules={preview.rules} subject="this file" />
        </Tabs.Panel>
        <Tabs.Panel value="rules" pt="sm">
          <RulesTable rules={preview.rules} label="Rules in the file" />
        </Tabs.Panel>
      </Tabs>
    </Stack>
  );
}
