import { useEffect, useRef, useState } from 'react';

/**
 * Follows the server's word on whether my connection may write (`readOnly`, null while it has not
 * said, e.g. during a reconnect). A change from what it last said means my role changed while the
 * page was open: `onChanged` runs (so the page's details are fetched afresh) and `demoted` tells
 * whether to explain why editing stopped. What holds when the page opens is no change.
 */
export function useWriteAccessChange(readOnly: boolean | null, onChanged?: () => void): { demoted: boolean; dismiss: () => void } {
  const lastKnown = useRef<boolean | null>(null);
  const [demoted, setDemoted] = useState(false);

  useEffect(() => {
    if (readOnly === null) return;
    const before = lastKnown.current;
    lastKnown.current = readOnly;
    if (before === null || before === readOnly) return;
    setDemoted(readOnly);
    onChanged?.();
  }, [readOnly, onChanged]);

  return { demoted, dismiss: () => setDemoted(false) };
}
