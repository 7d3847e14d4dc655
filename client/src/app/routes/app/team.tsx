import { Paper, Stack, Text, Title } from '@mantine/core';
import { useQueryClient } from '@tanstack/react-query';
import { PageHeader } from '@/components/page-header';
import { currentUserQueryKey } from '@/features/auth/api/get-current-user';
import { RequireRole } from '@/features/auth/components/require-role';
import { useSignedInUser } from '@/features/auth/hooks/use-signed-in-user';
import { InviteForm } from '@/features/team/components/invite-form';
import { InvitesTable } from '@/features/team/components/invites-table';
import { MembersTable } from '@/features/team/components/members-table';

function TeamPage() {
  const user = useSignedInUser();
  const queryClient = useQueryClient();

  return (
    <>
      <PageHeader
        title="Team"
        description={`Who can sign in to ${user.companyName}, and what each person can do.`}
      />
      <Stack gap="xl">
        <Paper p="lg" component="section" aria-labelledby="invite-title">
          <Title order={2} fz="h4" id="invite-title">
            Invite someone
          </Title>
          <Text size="sm" c="dimmed" mb="md">
            Owners manage the team and prices, estimators build quotes, crew leads run jobs.
          </Text>
          <InviteForm />
        </Paper>
        <section aria-labelledby="members-title">
          <Title order={2} fz="h4" id="members-title" mb="sm">
            Members
          </Title>
          <Paper p="md">
            <MembersTable
              currentUserId={user.id}
              onOwnAccountChanged={() =>
                queryClient.invalidateQueries({ queryKey: currentUserQueryKey })
              }
            />
          </Paper>
        </section>
        <section aria-labelledby="invites-title">
          <Title order={2} fz="h4" id="invites-title" mb="sm">
            Pending invites
          </Title>
          <Paper p="md">
            <InvitesTable />
          </Paper>
        </section>
      </Stack>
    </>
  );
}

export function TeamRoute() {
  return (
    <RequireRole area="team" areaName="team management">
      <TeamPage />
    </RequireRole>
  );
}
