import '@testing-library/jest-dom/vitest';
import 'vitest-canvas-mock';
import { cleanup } from '@testing-library/react';
import { afterEach } from 'vitest';

// jsdom has no layout, so it ships no ResizeObserver; Fluent's MessageBar and popovers need one.
class NoLayoutResizeObserver implements ResizeObserver {
  observe(): void {}
  unobserve(): void {}
  disconnect(): void {}
}
globalThis.ResizeObserver ??= NoLayoutResizeObserver;

afterEach(() => {
  cleanup();
  window.localStorage.clear();
});
