import { useEffect, type RefObject } from 'react';

/**
 * Closes an open popover when the pointer goes down outside `rootRef`, or on Escape (which also returns focus to the
 * button that opened it, so keyboard users are not lost).
 */
export function useDismissable(open: boolean, close: () => void, rootRef: RefObject<HTMLElement | null>, buttonRef: RefObject<HTMLElement | null>) {
  useEffect(() => {
    if (!open) return;
    function onPointerDown(event: PointerEvent) {
      if (!rootRef.current?.contains(event.target as Node)) close();
    }
    function onKeyDown(event: KeyboardEvent) {
      if (event.key === 'Escape') {
        close();
        buttonRef.current?.focus();
      }
    }
    document.addEventListener('pointerdown', onPointerDown);
    document.addEventListener('keydown', onKeyDown);
    return () => {
      document.removeEventListener('pointerdown', onPointerDown);
      document.removeEventListener('keydown', onKeyDown);
    };
  }, [open, close, rootRef, buttonRef]);
}
