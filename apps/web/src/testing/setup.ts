import '@testing-library/jest-dom/vitest';
import { cleanup } from '@testing-library/react';
import { afterEach } from 'vitest';

// jsdom lacks these browser APIs that Mantine relies on.
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
window.ResizeObserver = ResizeObserverStub as unknown as typeof ResizeObserver;

Object.defineProperty(window, 'scrollTo', { writable: true, value: () => {} });
Element.prototype.scrollIntoView = () => {};

// Textarea autosize re-measures when web fonts load.
if (!('fonts' in document)) {
  Object.defineProperty(document, 'fonts', { configurable: true, value: { addEventListener: () => {}, removeEventListener: () => {}, ready: Promise.resolve() } });
}

const { getComputedStyle } = window;
window.getComputedStyle = (element: Element) => getComputedStyle(element);

afterEach(() => cleanup());
