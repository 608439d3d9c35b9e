import '@testing-library/jest-dom/vitest';
import { cleanup, configure } from '@testing-library/react';
import { AxiosError, type InternalAxiosRequestConfig } from 'axios';
import { afterEach, vi } from 'vitest';
import { apiClient } from '@/lib/api-client';
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

// No test reaches a server: a request a test did not stub fails at once, as a lost connection would, instead of
// trying the network (and logging a refused connection) while the test goes on.
apiClient.defaults.adapter = (config: InternalAxiosRequestConfig) =>
  Promise.reject(new AxiosError(`No answer stubbed for ${config.method?.toUpperCase()} ${config.url} in this test`, AxiosError.ERR_NETWORK, config));

afterEach(() => {
  cleanup();
  window.localStorage.clear();
  vi.restoreAllMocks();
});
