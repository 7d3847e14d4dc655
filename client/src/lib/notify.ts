import { notifications } from '@mantine/notifications';
import type { ReactNode } from 'react';
import { errorMessage } from './api-error';

export function notifySuccess(message: ReactNode, title?: string): void {
  notifications.show({ color: 'reed', title, message });
}

export function notifyError(message: string, title = 'That did not work'): void {
  notifications.show({ color: 'red', title, message, autoClose: 8000 });
}

/** Shows any thrown value (an API error's `message`, a network failure) as an error notification. */
export function notifyApiError(error: unknown, title?: string): void {
  notifyError(errorMessage(error), title);
}
