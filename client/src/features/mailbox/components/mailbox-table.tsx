import { Fragment, useState } from 'react';
import { ActionIcon, Code, EmptyState, Skeleton, Table, VisuallyHidden } from '@mantine/core';
import { IconChevronDown, IconChevronRight, IconMailOff } from '@tabler/icons-react';
import { formatDateTime } from '@/utils/format-date';
import type { MailboxMessage } from '@lockstep/shared';

export interface MailboxTableProps {
  messages: MailboxMessage[];
  isLoading: boolean;
}

/** To, subject and time per e-mail; each opens to show its text. */
export function MailboxTable({ messages, isLoading }: MailboxTableProps) {
  const [open, setOpen] = useState<ReadonlySet<number>>(new Set());
  const toggle = (id: number) =>
    setOpen((current) => {
      const next = new Set(current);
      if (next.has(id)) next.delete(id);
      else next.add(id);
      return next;
    });

  return (
    <Table.ScrollContainer minWidth={720}>
      <Table aria-label="Sent e-mails" aria-busy={isLoading || undefined} tabularNums stickyHeader>
        <Table.Thead>
          <Table.Tr>
            <Table.Th w={44}>
              <VisuallyHidden>Text</VisuallyHidden>
            </Table.Th>
            <Table.Th>To</Table.Th>
            <Table.Th>Subject</Table.Th>
            <Table.Th w={180}>Sent</Table.Th>
          </Table.Tr>
        </Table.Thead>
        <Table.Tbody>
          {isLoading
            ? Array.from({ length: 4 }, (_, index) => (
                <Table.Tr key={index} aria-hidden>
                  <Table.Td colSpan={4}>
                    <Skeleton height={14} />
                  </Table.Td>
                </Table.Tr>
              ))
            : messages.map((message) => {
                const expanded = open.has(message.id);
                const textId = `mail-text-${message.id}`;
                return (
                  <Fragment key={message.id}>
                    <Table.Tr>
                      <Table.Td>
                        <ActionIcon
                          variant="subtle"
                          color="gray"
                          onClick={() => toggle(message.id)}
                          aria-expanded={expanded}
                          aria-controls={expanded ? textId : undefined}
                          aria-label={`${expanded ? 'Hide' : 'Show'} the text of “${message.subject}”`}
                        >
                          {expanded ? <IconChevronDown size={16} aria-hidden /> : <IconChevronRight size={16} aria-hidden />}
                        </ActionIcon>
                      </Table.Td>
                      <Table.Td>{message.to}</Table.Td>
                      <Table.Td fw={500}>{message.subject}</Table.Td>
                      <Table.Td>{formatDateTime(message.at)}</Table.Td>
                    </Table.Tr>
                    {expanded ? (
                      <Table.Tr>
                        <Table.Td />
                        <Table.Td colSpan={3} id={textId}>
                          <Code block style={{ whiteSpace: 'pre-wrap' }}>
                            {message.text}
                          </Code>
                        </Table.Td>
                      </Table.Tr>
                    ) : null}
                  </Fragment>
                );
              })}
          {!isLoading && messages.length === 0 ? (
            <Table.Tr>
              <Table.Td colSpan={4}>
                <EmptyState
                  size="sm"
                  icon={<IconMailOff aria-hidden />}
                  title="No e-mail yet"
                  description="Signing, returning and releasing send e-mail; it appears here."
                />
              </Table.Td>
            </Table.Tr>
          ) : null}
        </Table.Tbody>
      </Table>
    </Table.ScrollContainer>
  );
}
