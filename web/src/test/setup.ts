import '@testing-library/jest-dom/vitest';
import { cleanup, configure } from '@testing-library/react';
import { afterEach, vi } from 'vitest';
import { staticMediaQueryList } from './viewport';

// antd renders slowly in jsdom on a busy 2-core machine; findBy/waitFor get room beyond the 1 s default.
configure({ asyncUtilTimeout: 5000 });

// jsdom lacks these browser APIs that antd relies on.
if (!window.matchMedia) {
  Object.defineProperty(window, 'matchMedia', { writable: true, value: (query: string) => staticMediaQueryList(query, false) });
}

if (!('ResizeObserver' in window)) {
  class ResizeObserverStub {
    observe() {}
    unobserve() {}
    disconnect() {}
  }
  Object.defineProperty(window, 'ResizeObserver', { writable: true, value: ResizeObserverStub });
}

// jsdom does not implement pseudo-element styles and logs an error for each call.
const realGetComputedStyle = window.getComputedStyle.bind(window);
window.getComputedStyle = (elt: Element) => realGetComputedStyle(elt);

afterEach(() => {
  cleanup();
  window.localStorage.clear();
  vi.restoreAllMocks();
});
