import { Button, Group, Text } from '@mantine/core';
import { notifications } from '@mantine/notifications';
import { registerSW } from 'virtual:pwa-register';

const UPDATE_NOTICE_ID = 'pondwright-update-ready';

/**
 * Registers the service worker that keeps the app on this device (built by vite-plugin-pwa; see
 * vite.config.ts). A new version waits for the person to reload rather than reloading under them:
 * a crew lead may be halfway through a log.
 */
export function registerServiceWorker(): void {
  if (!('serviceWorker' in navigator)) return;
  const updateServiceWorker = registerSW({
    onNeedRefresh() {
      notifications.show({
        id: UPDATE_NOTICE_ID,
        color: 'reed',
        autoClose: false,
        title: 'A new version of Pondwright is ready',
        message: (
          <Group justify="space-between" wrap="nowrap" gap="sm">
            <Text size="sm">Reload when you are ready; what you typed in a log is kept.</Text>
            <Button size="xs" onClick={() => void updateServiceWorker(true)}>
              Reload
            </Button>
          </Group>
        ),
      });
    },
  });
}
