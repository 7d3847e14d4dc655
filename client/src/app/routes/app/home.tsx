import { SimpleGrid, Stack } from '@mantine/core';
import { useSignedInUser } from '@/features/auth/hooks/use-signed-in-user';
import { OwnerDashboard } from '@/features/dashboard/components/owner-dashboard';
import { RoleGuide } from '@/features/home/components/role-guide';
import { WelcomeCard } from '@/features/home/components/welcome-card';
import { SafetyReminders } from '@/features/safety/components/safety-reminders';
import { canAccess } from '@/lib/authorization';

export function HomeRoute() {
  const user = useSignedInUser();
  return (
    <Stack gap="lg">
      <WelcomeCard name={user.name} role={user.role} companyName={user.companyName} />
      {canAccess(user.role, 'dashboard') && <OwnerDashboard />}
      <SimpleGrid cols={{ base: 1, md: 2 }} spacing="lg">
        <RoleGuide role={user.role} />
        <SafetyReminders />
      </SimpleGrid>
    </Stack>
  );
}
