import { Badge, Button, Group, List, Modal, Stack, Text } from '@mantine/core';
import { IconDeviceFloppy, IconLock } from '@tabler/icons-react';
import { useState } from 'react';
import { ConfirmDialog } from '@/components/confirm-dialog';
import type { EstimateEditor } from '../hooks/use-estimate-editor';

/** Save and finalise, and the dialog a stale save opens; a newer draft is never overwritten silently. */
export function EstimateActions({ editor }: { editor: EstimateEditor }) {
  const [confirming, setConfirming] = useState(false);
  const [reloading, setReloading] = useState(false);

  return (
    <>
      <Group gap="sm">
        {editor.dirty && !editor.locked && (
          <Badge color="clay" variant="light" tt="none">
            Unsaved changes
          </Badge>
        )}
        <Button
          leftSection={<IconDeviceFloppy size={16} />}
          loading={editor.saving}
          disabled={editor.locked}
          title={editor.locked ? 'Accepted quotes are locked' : undefined}
          onClick={editor.saveDraft}
        >
          Save draft
        </Button>
        <Button
          variant="light"
          leftSection={<IconLock size={16} />}
          disabled={editor.dirty || editor.locked}
          title={
            editor.locked
              ? 'Accepted quotes are locked'
              : editor.dirty
                ? 'Save the draft before finalising it'
                : undefined
          }
          onClick={() => setConfirming(true)}
        >
          Finalise
        </Button>
      </Group>
      <ConfirmDialog
        opened={confirming}
        title="Finalise this estimate?"
        confirmLabel="Finalise"
        loading={editor.finalising}
        error={editor.finaliseError}
        onCancel={() => setConfirming(false)}
        onConfirm={() => editor.finaliseDraft(() => setConfirming(false))}
      >
        Revision {editor.revision} becomes the next numbered version and can no longer change. If it
        needs an owner’s approval, it goes to the owner first.
      </ConfirmDialog>
      <Modal
        opened={editor.conflict !== null}
        onClose={editor.keepEditing}
        title="Someone else saved this draft"
        centered
      >
        <Stack gap="md">
          <Text size="sm">
            {editor.conflict?.message} Your changes were not saved, and are still here.
          </Text>
          {editor.conflict && editor.conflict.details.length > 0 && (
            <List size="sm" aria-label="What changed">
              {editor.conflict.details.map((detail) => (
                <List.Item key={detail.field}>
                  <Text span fw={600} size="sm">
                    {detail.field}
                  </Text>
                  : {detail.message}
                </List.Item>
              ))}
            </List>
          )}
          <Group justify="flex-end" gap="sm">
            <Button variant="default" onClick={editor.keepEditing}>
              Keep editing
            </Button>
            <Button
              loading={reloading}
              onClick={() => {
                setReloading(true);
                void editor.reloadServerDraft().finally(() => setReloading(false));
              }}
            >
              Load the server’s draft
            </Button>
          </Group>
        </Stack>
      </Modal>
    </>
  );
}
