import type { NotificationInstance } from 'antd/es/notification/interface';
import { createElement, Fragment, type ReactNode } from 'react';

/**
 * The api client lives outside React, but notifications must use the themed instance
 * from antd's <App>. The provider registers that instance here.
 */
let instance: NotificationInstance | null = null;

export function registerNotifier(next: NotificationInstance | null): void {
  instance = next;
}

export type NotifyOptions = {
  title: string;
  description?: string;
  key?: string;
  /** The server's correlation id of the request, for support: shown in small print under the sentence. */
  reference?: string;
};

/** The sentence, and the reference (if any) in small print on a line of its own. */
export function withReference(description: string | undefined, reference: string | undefined): ReactNode {
  if (!reference) return description;
  const small = createElement('div', { style: { fontSize: 12, opacity: 0.65, marginTop: 4 }, 'data-testid': 'error-reference' }, `Reference ${reference}`);
  return createElement(Fragment, null, description, small);
}

export function notifyError({ title, description, key, reference }: NotifyOptions): void {
  instance?.error({ title, description: withReference(description, reference), key, placement: 'topRight' });
}

/**
 * A confirmation closes after 3 s even under the pointer: it appears where buttons were just clicked (the page header,
 * a drawer's footer), and pausing on hover kept it open over them.
 */
export function notifySuccess({ title, description, key }: NotifyOptions): void {
  instance?.success({ title, description, key, placement: 'topRight', duration: 3, pauseOnHover: false });
}
