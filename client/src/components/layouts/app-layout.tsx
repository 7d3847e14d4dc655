import {
  AppShell,
  Burger,
  Container,
  Group,
  NavLink,
  Stack,
  Text,
  useMantineTheme,
} from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import type { Icon } from '@tabler/icons-react';
import type { ReactNode } from 'react';
import { NavLink as RouterNavLink, useLocation } from 'react-router-dom';
import { Brand } from '../brand';

export type AppNavItem = {
  label: string;
  to: string;
  icon: Icon;
  description?: string;
};

type AppLayoutProps = {
  navItems: AppNavItem[];
  userMenu: ReactNode;
  children: ReactNode;
};

function isActive(pathname: string, to: string): boolean {
  return to === '/' ? pathname === '/' : pathname === to || pathname.startsWith(`${to}/`);
}

export function AppLayout({ navItems, userMenu, children }: AppLayoutProps) {
  const [navOpened, { toggle, close }] = useDisclosure(false);
  const { pathname } = useLocation();
  const theme = useMantineTheme();

  return (
    <AppShell
      header={{ height: theme.other.headerHeight as number }}
      navbar={{
        width: theme.other.navbarWidth as number,
        breakpoint: 'sm',
        collapsed: { mobile: !navOpened },
      }}
      padding="lg"
    >
      <AppShell.Header>
        <Group h="100%" px="md" justify="space-between" wrap="nowrap">
          <Group gap="sm" wrap="nowrap">
            <Burger
              opened={navOpened}
              onClick={toggle}
              hiddenFrom="sm"
              size="sm"
              aria-label={navOpened ? 'Close navigation' : 'Open navigation'}
            />
            <Brand />
          </Group>
          {userMenu}
        </Group>
      </AppShell.Header>

      <AppShell.Navbar p="sm" aria-label="Main">
        <Stack gap={4} component="nav">
          {navItems.map((item) => (
            <NavLink
              key={item.to}
              component={RouterNavLink}
              to={item.to}
              label={item.label}
              description={item.description}
              leftSection={<item.icon size={18} stroke={1.6} />}
              active={isActive(pathname, item.to)}
              onClick={close}
              variant="light"
            />
          ))}
        </Stack>
        <Text c="dimmed" size="xs" mt="auto" px="xs">
          More tools will appear here as they arrive.
        </Text>
      </AppShell.Navbar>

      <AppShell.Main>
        <Container size="lg" px={0}>
          {children}
        </Container>
      </AppShell.Main>
    </AppShell>
  );
}
