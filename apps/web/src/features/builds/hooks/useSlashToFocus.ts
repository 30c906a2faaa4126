import { useEffect, type RefObject } from 'react';

const typingTargets = new Set(['INPUT', 'TEXTAREA', 'SELECT']);

/** `/` focuses the given field unless the user is already typing somewhere. */
export function useSlashToFocus(ref: RefObject<HTMLElement | null>): void {
  useEffect(() => {
    function onKeyDown(event: KeyboardEvent) {
      if (event.key !== '/' || event.ctrlKey || event.metaKey || event.altKey) return;
      const target = event.target as HTMLElement | null;
      if (target && (typingTargets.has(target.tagName) || target.isContentEditable)) return;
      event.preventDefault();
      ref.current?.focus();
    }
    document.addEventListener('keydown', onKeyDown);
    return () => document.removeEventListener('keydown', onKeyDown);
  }, [ref]);
}
