import { useEffect, useRef, useState } from 'react';

/**
 * A text box backed by the address: typing stays local and is committed after a pause, and a change that comes
 * from elsewhere (back button, a removed chip) replaces what the box shows.
 */
export function useDebouncedCommit(value: string, commit: (next: string) => void, delayMs = 350): [string, (next: string) => void] {
  const [text, setText] = useState(value);
  const committed = useRef(value);
  const commitRef = useRef(commit);
  commitRef.current = commit;

  useEffect(() => {
    if (value !== committed.current) {
      committed.current = value;
      setText(value);
    }
  }, [value]);

  useEffect(() => {
    if (text === committed.current) return;
    const timer = setTimeout(() => {
      committed.current = text;
      commitRef.current(text);
    }, delayMs);
    return () => clearTimeout(timer);
  }, [text, delayMs]);

  return [text, setText];
}
