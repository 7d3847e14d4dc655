import { Alert, Button, Group, Modal, Stack, Text, TextInput } from '@mantine/core';
import { IconCircleCheck, IconReceipt2 } from '@tabler/icons-react';
import { useState } from 'react';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { errorMessage, isApiError } from '@/lib/api-error';
import { formatMoney } from '@/lib/format';
import { useCreatePricedTakeoff } from '../api/create-priced-takeoff';

type SavePricedTakeoffButtonProps = {
  /** The takeoff's engine input as it stands on screen. */
  input: unknown;
};

/** Saves the takeoff on screen and prices it with the company's current price book. */
export function SavePricedTakeoffButton({ input }: SavePricedTakeoffButtonProps) {
  const [opened, setOpened] = useState(false);
  const [name, setName] = useState('');
  const create = useCreatePricedTakeoff();
  const nameMissing = name.trim() === '';
  const created = create.data;

  const open = () => {
    create.reset();
    setOpened(true);
  };

  return (
    <>
      <Button size="xs" variant="light" leftSection={<IconReceipt2 size={14} />} onClick={open}>
        Save and price
      </Button>
      <Modal opened={opened} onClose={() => setOpened(false)} title="Save and price this takeoff">
        {created ? (
          <Stack gap="md">
            <Alert color="reed" variant="light" icon={<IconCircleCheck />} role="status">
              {created.name} is priced at {formatMoney(created.priced.totals.total)} with price book
              version {created.priceBookVersion.versionNumber}.
            </Alert>
            <Group justify="flex-end">
              <Button variant="default" onClick={() => setOpened(false)}>
                Close
              </Button>
              <Button component={Link} to={paths.pricedTakeoff.getHref(created.id)}>
                Open it
              </Button>
            </Group>
          </Stack>
        ) : (
          <form
            noValidate
            onSubmit={(event) => {
              event.preventDefault();
              if (!nameMissing) create.mutate({ name: name.trim(), input });
            }}
          >
            <Stack gap="md">
              <TextInput
                label="Name"
                description="e.g. the client and the feature"
                placeholder="Back-garden pond and stream"
                data-autofocus
                required
                maxLength={120}
                value={name}
                onChange={(event) => setName(event.currentTarget.value)}
              />
              {create.isError && (
                <Text c="red" size="sm" role="alert">
                  {isApiError(create.error, 404)
                    ? 'Your company has no price book yet. An owner sets one up under Price book.'
                    : errorMessage(create.error)}
                </Text>
              )}
              <Group justify="flex-end">
                <Button variant="default" onClick={() => setOpened(false)}>
                  Cancel
                </Button>
                <Button type="submit" loading={create.isPending} disabled={nameMissing}>
                  Save and price
                </Button>
              </Group>
            </Stack>
          </form>
        )}
      </Modal>
    </>
  );
}
