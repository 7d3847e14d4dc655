import { Button, Group, Modal, Stack, Text, Textarea } from '@mantine/core';
import { sendBackEstimateRequestSchema, type ApprovalQueueItem } from '@pondwright/shared';
import { applyApiErrorToForm, useSchemaForm } from '@/lib/form';
import { notifySuccess } from '@/lib/notify';
import { useSendBackEstimate } from '../api/send-back-estimate';

type SendBackModalProps = {
  item: ApprovalQueueItem | null;
  onClose: () => void;
};

export function SendBackModal({ item, onClose }: SendBackModalProps) {
  const form = useSchemaForm(sendBackEstimateRequestSchema, { comment: '' });
  const sendBack = useSendBackEstimate();

  const close = () => {
    form.reset();
    sendBack.reset();
    onClose();
  };

  const submit = form.onSubmit(({ comment }) => {
    if (!item) return;
    sendBack.mutate(
      { estimateId: item.estimateId, comment },
      {
        onSuccess: () => {
          notifySuccess(`#${item.number} went back to its estimator.`, 'Sent back');
          close();
        },
        onError: (error) => applyApiErrorToForm(form, error, 'Could not send the estimate back'),
      },
    );
  });

  return (
    <Modal opened={item !== null} onClose={close} title="Send back for changes" centered>
      <form onSubmit={submit} noValidate aria-label="Send back for changes">
        <Stack gap="sm">
          <Text size="sm">
            #{item?.number} {item?.title} returns to draft with your comment in its history.
          </Text>
          <Textarea
            label="What needs to change"
            required
            rows={4}
            data-autofocus
            {...form.getInputProps('comment')}
          />
          <Group justify="flex-end" gap="sm">
            <Button variant="default" onClick={close}>
              Cancel
            </Button>
            <Button type="submit" color="clay" loading={sendBack.isPending}>
              Send back
            </Button>
          </Group>
        </Stack>
      </form>
    </Modal>
  );
}
