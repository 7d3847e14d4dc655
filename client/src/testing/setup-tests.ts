import '@testing-library/jest-dom/vitest';
import { cleanNotifications } from '@mantine/notifications';
import { act, cleanup } from '@testing-library/react';
import { afterEach, beforeEach, vi } from 'vitest';
import { clearAccessToken } from '@/lib/api-client';

// jsdom lacks the layout APIs Mantine reads; these stand-ins report "no media query matches".
Object.defineProperty(window, 'matchMedia', {
  writable: true,
  value: (query: string) => ({
    matches: false,
    media: query,
    onchange: null,
    addListener: () => {},
    removeListener: () => {},
    addEventListener: () => {},
    removeEventListener: () => {},
    dispatchEvent: () => false,
  }),
});

class ResizeObserverStub {
  observe() {}
  unobserve() {}
  disconnect() {}
}
window.ResizeObserver = ResizeObserverStub;
window.HTMLElement.prototype.scrollIntoView = () => {};

beforeEach(() => {
  clearAccessToken();
  window.localStorage.clear();
  window.sessionStorage.clear();
});

afterEach(() => {
  act(() => cleanNotifications());
  cleanup();
  vi.unstubAllGlobals();
});
