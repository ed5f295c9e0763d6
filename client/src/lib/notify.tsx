import { notifications } from '@mantine/notifications';
import { IconAlertCircle, IconCheck } from '@tabler/icons-react';

/** A brief confirmation that an action worked; icon and word as well as colour. */
export function notifySuccess(title: string, message: string): void {
  notifications.show({ title, message, color: 'green', icon: <IconCheck size={18} aria-hidden /> });
}

/** An action that failed where there is no form field to show it beside. */
export function notifyError(title: string, message: string): void {
  notifications.show({ title, message, color: 'red', icon: <IconAlertCircle size={18} aria-hidden />, autoClose: 8000 });
}
