import { useState } from 'react';
import { EmptyState, Paper, Skeleton, Stack, Tabs } from '@mantine/core';
import { IconBooksOff } from '@tabler/icons-react';
import type { Drug, LibraryVersionDetail } from '@lockstep/shared';
import { QueryErrorAlert } from '@/components/errors/query-error-alert';
import { isApiRequestError } from '@/lib/api-error';
import { useActiveLibrary } from '@/api/library/get-active-library';
import { useLibraryDiff } from '@/api/library/get-library-diff';
import { useLibraryVersion } from '@/api/library/get-library-version';
import { LibraryDiffView } from './library-diff-view';
import { RulesTable } from './rules-table';
import { VersionActions } from './version-actions';
import { VersionHeader } from './version-header';

export interface VersionPanelProps {
  wardId: number;
  /** The version chosen in the address; null shows the ward's active version. */
  versionId: number | null;
  drugs: Drug[];
  currentUserId: number;
  weightBased: boolean;
  onDiscarded: () => void;
}

export function VersionPanel({ wardId, versionId, ...props }: VersionPanelProps) {
  const activeQuery = useActiveLibrary(wardId, { enabled: versionId === null });
  const versionQuery = useLibraryVersion(versionId);
  const query = versionId === null ? activeQuery : versionQuery;

  if (query.isPending) {
    return (
      <Stack gap="sm" aria-busy aria-label="Loading the library version">
        <Skeleton height={28} width="45%" />
        <Skeleton height={80} />
        <Skeleton height={240} />
      </Stack>
    );
  }
  if (query.isError) {
    const notFound = isApiRequestError(query.error) && query.error.status === 404;
    if (notFound && versionId === null) {
      return (
        <EmptyState
          icon={<IconBooksOff aria-hidden />}
          title="No active library"
          description={`${query.error.message}. Choose a version above, or import a CSV to start one.`}
        />
      );
    }
    return (
      <QueryErrorAlert
        title="The library version could not be loaded"
        error={query.error}
        onRetry={notFound ? undefined : () => void query.refetch()}
      />
    );
  }
  // Keyed by id so the tabs start afresh for each version.
  return <VersionDetail key={query.data.id} version={query.data} {...props} />;
}

type VersionDetailProps = Omit<VersionPanelProps, 'wardId' | 'versionId'> & { version: LibraryVersionDetail };

function VersionDetail({ version, ...actionProps }: VersionDetailProps) {
  const open = version.status === 'draft' || version.status === 'pending_approval';
  // An approver starts from what changes; an author editing a draft, from the rules.
  const [tab, setTab] = useState<string | null>(version.status === 'pending_approval' ? 'changes' : 'rules');
  const diffQuery = useLibraryDiff(version.id, { enabled: open && tab === 'changes' });
  const rules = <RulesTable rules={version.rules} label="Limit rules" empty="This version has no rules yet. Use Edit rules to add them." />;

  return (
    <Paper withBorder radius="md" p="md">
      <Stack gap="md">
        <VersionHeader version={version} />
        <div>
          <VersionActions version={version} {...actionProps} />
        </div>
        {open ? (
          <Tabs value={tab} onChange={setTab} keepMounted={false}>
            <Tabs.List>
              <Tabs.Tab value="rules">Rules ({version.rules.length})</Tabs.Tab>
              <Tabs.Tab value="changes">Changes from active</Tabs.Tab>
            </Tabs.List>
            <Tabs.Panel value="rules" pt="md">
              {rules}
            </Tabs.Panel>
            <Tabs.Panel value="changes" pt="md">
              {diffQuery.isPending ? <Skeleton height={160} /> : null}
              {diffQuery.isError ? (
                <QueryErrorAlert title="The changes could not be loaded" error={diffQuery.error} onRetry={() => void diffQuery.refetch()} />
              ) : null}
              {diffQuery.data ? <LibraryDiffView diff={diffQuery.data} rules={version.rules} subject="this version" /> : null}
            </Tabs.Panel>
          </Tabs>
        ) : (
          rules
        )}
      </Stack>
    </Paper>
  );
}
