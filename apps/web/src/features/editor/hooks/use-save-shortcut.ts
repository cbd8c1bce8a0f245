import { useEffect, useRef } from 'react';

/** Ctrl+S / Cmd+S saves instead of opening the browser's "save page" dialog, wherever focus is. */
export function useSaveShortcut(onSave: () => void) {
  const handler = useRef(onSave);
  useEffect(() => {
    handler.current = onSave;
  });
  useEffect(() => {
    const onKeyDown = (event: KeyboardEvent) => {
      if ((event.ctrlKey || event.metaKey) && !event.altKey && event.key.toLowerCase() === 's') {
        event.preventDefault();
        handler.current();
      }
    };
    window.addEventListener('keydown', onKeyDown, { capture: true });
    return () => window.removeEventListener('keydown', onKeyDown, { capture: true });
  }, []);
}
