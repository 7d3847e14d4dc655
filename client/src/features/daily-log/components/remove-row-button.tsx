import { ActionIcon } from '@mantine/core';
import { IconTrash } from '@tabler/icons-react';

/** 44 px or more: a gloved thumb on a muddy screen should not hit the neighbouring field. */
export function RemoveRowButton({ label, onClick }: { label: string; onClick: () => void }) {
  return (
    <ActionIcon
      variant="subtle"
      color="red"
      size={48}
      aria-label={`Remove ${label}`}
      onClick={onClick}
      mt={30}
    >
      <IconTrash size={22} />
    </ActionIcon>
  );
}
