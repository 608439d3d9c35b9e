import { fireEvent, waitFor } from '@testing-library/react';
import { expect, type MockInstance } from 'vitest';

/** Two clicks in one go, as a double-click lands: both before React re-renders the button as loading. */
export function doubleClick(element: HTMLElement): void {
  fireEvent.click(element);
  fireEvent.click(element);
}

/** The request went out once, and no second one follows while the first is still unanswered. */
export async function expectSentOnce(send: MockInstance, url?: string): Promise<void> {
  const calls = () => send.mock.calls.filter(([calledUrl]) => url === undefined || calledUrl === url);
  await waitFor(() => expect(calls()).toHaveLength(1));
  // Give the second click's form validation every chance to send before the server answers.
  await new Promise((resolve) => setTimeout(resolve, 100));
  expect(calls()).toHaveLength(1);
}

/** A server answer the test releases when it chooses, so the first request stays in flight meanwhile. */
export function heldAnswer<T>(): { promise: Promise<T>; resolve: (value: T) => void } {
  let resolve!: (value: T) => void;
  const promise = new Promise<T>((r) => (resolve = r));
  return { promise, resolve };
}
