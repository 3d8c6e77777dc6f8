import { afterEach } from 'vitest';
import { cleanup } from '@testing-library/react';

// vitest runs without globals, so testing-library cannot register its own cleanup.
afterEach(cleanup);

// jsdom lacks these browser APIs that Blueprint and the charts touch.
class ResizeObserverStub {
  observe() {}
  unobserve() {}
  disconnect() {}
}
(globalThis as unknown as { ResizeObserver: unknown }).ResizeObserver ??= ResizeObserverStub;
if (!window.matchMedia) {
  window.matchMedia = (query: string) =>
    ({
      matches: false,
      media: query,
      onchange: null,
      addListener() {},
      removeListener() {},
      addEventListener() {},
      removeEventListener() {},
      dispatchEvent: () => false,
    }) as MediaQueryList;
}
