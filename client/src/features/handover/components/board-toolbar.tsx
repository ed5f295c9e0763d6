import { Button, Chip, Group, Progress, Stack, Text } from '@mantine/core';
import { IconPrinter } from '@tabler/icons-react';
import { Link } from 'react-router-dom';
import type { BoardFilters, SignoffProgress } from '../utils/board-filters';
import { signoffProgressText } from '../utils/board-filters';

export interface BoardToolbarProps {
  filters: BoardFilters;
  onFiltersChange: (filters: BoardFilters) => void;
  progress: SignoffProgress;
  shownCount: number;
  totalCount: number;
  printHref: string;
}

/** Filters on the left; the shift's sign-off progress and the printed sheet on the right. */
export function BoardToolbar({ filters, onFiltersChange, progress, shownCount, totalCount, printHref }: BoardToolbarProps) {
  const percent = progress.total === 0 ? 0 : Math.round((progress.confirmed / progress.total) * 100);
  const progressText = signoffProgressText(progress);
  return (
    <Group justify="space-between" align="flex-end" gap="md" wrap="wrap">
      <Group gap="xs" align="center">
        <Chip size="sm" checked={filters.onlyFlagged} onChange={(checked) => onFiltersChange({ ...filters, onlyFlagged: checked })}>
          Only flagged
        </Chip>
        <Chip size="sm" checked={filters.onlyOverdue} onChange={(checked) => onFiltersChange({ ...filters, onlyOverdue: checked })}>
          Only overdue
        </Chip>
        <Text size="sm" c="dimmed" aria-live="polite">
          Showing {shownCount} of {totalCount} {totalCount === 1 ? 'PCA' : 'PCAs'}
        </Text>
      </Group>
      <Group gap="md" align="flex-end">
        <Stack gap={4} w={220}>
          <Text size="sm" fw={600} data-testid="signoff-progress">
            {progressText}
          </Text>
          <Progress value={percent} size="sm" color="teal" aria-label={`Handover sign-off: ${progressText}`} />
        </Stack>
        <Button component={Link} to={printHref} variant="default" leftSection={<IconPrinter size={16} aria-hidden />}>
          Print handover sheet
        </Button>
      </Group>
    </Group>
  );
}
