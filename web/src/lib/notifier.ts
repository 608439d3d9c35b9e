import type { NotificationInstance } from 'antd/es/notification/interface';

/**
 * The api client lives outside React, but notifications must use the themed instance
 * from antd's <App>. The provider registers that instance here.
 */
let instance: NotificationInstance | null = null;

export function registerNotifier(next: NotificationInstance | null): void {
  instance = next;
}

export type NotifyOptions = { title: string; description?: string; key?: string };

export function notifyError({ title, description, key }: NotifyOptions): void {
  instance?.error({ title, description, key, placement: 'topRight' });
}

export function notifySuccess({ title, description, key }: NotifyOptions): void {
  instance?.success({ title, description, key, placement: 'topRight', duration: 3 });
}
