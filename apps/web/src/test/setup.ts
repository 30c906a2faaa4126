import '@testing-library/jest-dom/vitest';
import 'vitest-canvas-mock';
import { cleanup, configure } from '@testing-library/react';
import { afterEach } from 'vitest';

// Lazy route chunks are transformed on first use, which can take seconds on a busy machine.
configure({ asyncUtilTimeout: 5000 });

// jsdom has no layout, so it ships no ResizeObserver; Fluent's MessageBar and popovers need one.
class NoLayoutResizeObserver implements ResizeObserver {
  observe(): void {}
  unobserve(): void {}
  disconnect(): void {}
}
globalThis.ResizeObserver ??= NoLayoutResizeObserver;

// Fluent's focus management (tabster) treats elements without an offsetParent, or a body without
// a size, as not displayed; it then never activates an open dialog and marks it aria-hidden.
// Give jsdom the two layout facts a rendered page has.
Object.defineProperty(HTMLElement.prototype, 'offsetParent', {
  configurable: true,
  get(this: HTMLElement) {
    return this.isConnected ? this.parentElement : null;
  },
});
HTMLBodyElement.prototype.getBoundingClientRect = () => new DOMRect(0, 0, 1280, 800);

afterEach(() => {
  cleanup();
  window.localStorage.clear();
});
