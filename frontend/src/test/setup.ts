import '@testing-library/jest-dom/vitest';
import { cleanup, configure } from '@testing-library/react';
import { afterEach, vi } from 'vitest';

// Lazy routes load modules on first visit; on a busy CI machine that can take longer than the 1 s default.
configure({ asyncUtilTimeout: 5_000 });

// jsdom has no layout, so scrolling (used by the router's scroll restoration) is a no-op here.
window.scrollTo = vi.fn() as unknown as typeof window.scrollTo;

// jsdom's Blob lacks text(); the import page reads chosen files with it, as browsers allow.
if (typeof Blob.prototype.text !== 'function') {
  Blob.prototype.text = function text(this: Blob) {
    return new Promise<string>((resolve, reject) => {
      const reader = new FileReader();
      reader.onload = () => resolve(String(reader.result));
      reader.onerror = () => reject(reader.error);
      reader.readAsText(this);
    });
  };
}

afterEach(() => {
  cleanup();
  // Column choices and the comparison list live in web storage; each test starts from a fresh browser.
  window.localStorage.clear();
  window.sessionStorage.clear();
});
