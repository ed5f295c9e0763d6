import type { ComponentType, ReactNode } from 'react';
import { AppShell, Burger, Button, Group, NavLink, Stack, Text } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import {
  IconAdjustments,
  IconArrowsExchange,
  IconBooks,
  IconClipboardCheck,
  IconClipboardList,
  IconHeartbeat,
  IconHistory,
  IconLogout,
  IconMail,
  IconScale,
  IconUsers,
  IconUsersGroup,
  type IconProps,
} from '@tabler/icons-react';
import { Link, useLocation } from 'react-router-dom';
import { ROLE_LABELS } from '@lockstep/shared';
import { navItemsFor, type NavIcon } from '@/config/navigation';
import { useCurrentUser, useSession } from '@/lib/auth/use-session';
import { DecisionSupportNote } from '../ui/decision-support-note';
import { UrgentFlagsBell } from './urgent-flags-bell';
import { AssignedWards } from './assigned-wards';
import { LockstepMark } from '../ui/lockstep-mark';

const NAV_ICONS: Record<NavIcon, ComponentType<IconProps>> = {
  patients: IconUsersGroup,
  library: IconBooks,
  equianalgesic: IconScale,
  users: IconUsers,
  orders: IconClipboardList,
  verification: IconClipboardCheck,
  mailbox: IconMail,
  bedside: IconHeartbeat,
  handover: IconArrowsExchange,
  policy: IconAdjustments,
  audit: IconHistory,
};

export function AppShellLayout({ children }: { children: ReactNode }) {
  const user = useCurrentUser();
  const { signOut } = useSession();
  const location = useLocation();
  const [navOpened, { toggle: toggleNav, close: closeNav }] = useDisclosure(false);
  const items = navItemsFor(user.role);

  return (
    <AppShell header={{ height: 56 }} navbar={{ width: 220, breakpoint: 'sm', collapsed: { mobile: !navOpened } }} padding="md">
      <AppShell.Header>
        <Group h="100%" px="md" justify="space-between" wrap="nowrap">
          <Group gap="sm" wrap="nowrap">
            <Burger opened={navOpened} onClick={toggleNav} hiddenFrom="sm" size="sm" aria-label="Show navigation" />
            <LockstepMark size={26} />
            <Text fw={700} fz="lg" c="lagoon.8">
              Lockstep
            </Text>
          </Group>
          <Group gap="md" wrap="nowrap">
            {user.role === 'prescriber' ? <UrgentFlagsBell /> : null}
            <AssignedWards wards={user.wards} />
            <div>
              <Text size="sm" fw={600} lh={1.2} data-testid="current-user-name">
                {user.displayName}
              </Text>
              <Text size="xs" c="dimmed" lh={1.2}>
                {ROLE_LABELS[user.role]}
              </Text>
            </div>
            <Button variant="default" size="xs" leftSection={<IconLogout size={14} aria-hidden />} onClick={signOut}>
              Sign out
            </Button>
          </Group>
        </Group>
      </AppShell.Header>

      <AppShell.Navbar p="xs" aria-label="Main navigation">
        <Stack justify="space-between" h="100%">
          <div>
            {items.map((item) => {
              const Icon = NAV_ICONS[item.icon];
              const active = location.pathname === item.href || location.pathname.startsWith(`${item.href}/`);
              return (
                <NavLink
                  key={item.href}
                  component={Link}
                  to={item.href}
                  label={item.label}
                  leftSection={<Icon size={18} aria-hidden />}
                  active={active}
                  aria-current={active ? 'page' : undefined}
                  onClick={closeNav}
                />
              );
            })}
          </div>
          <DecisionSupportNote p="xs" />
        </Stack>
      </AppShell.Navbar>

      <AppShell.Main>{children}</AppShell.Main>
    </AppShell>
  );
}
