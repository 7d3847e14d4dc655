import '@testing-library/jest-dom/vitest';
import { cleanNotifications } from '@mantine/notifications';
import { act, cleanup, configure } from '@testing-library/react';
import { afterEach, beforeEach, vi } from 'vitest';
import { clearAccessToken } from '@/lib/api-client';

// A loaded 2-core machine can take seconds to load a lazy route or recompute in jsdom; findBy and waitFor
// wait up to 10 s (the test itself up to 20 s, see vitest.config.ts) so only real failures fail.
configure({ asyncUtilTimeout: 10_000 });

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
