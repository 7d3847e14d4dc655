import { Alert } from '@mantine/core';
import { IconWifiOff } from '@tabler/icons-react';

/**
 * Across the top of every page while the app runs from the person remembered on this device: what
 * still works, and that nothing is lost. It goes as soon as the session is confirmed online.
 */
export function OfflineStartBanner() {
  return (
    <Alert
      color="clay"
      variant="filled"
      mb="md"
      icon={<IconWifiOff />}
      title="No connection: opened from this device"
      role="status"
    >
      The daily log works from the copies on this device. What you log is kept here and sent by
      itself when the signal returns. Other pages need a connection.
    </Alert>
  );
}
