import { useEffect, useState } from 'react';

const EVENT = 'siteband:sign-out-blocked';

/** Tells the screens that a sign-out was refused because records still wait for the server. */
export function notifySignOutBlocked(): void {
  window.dispatchEvent(new Event(EVENT));
}

/** True from a refused sign-out until `dismiss` is called. */
export function useSignOutBlocked(): { blocked: boolean; dismiss: () => void } {
  const [blocked, setBlocked] = useState(false);
  useEffect(() => {
    const onBlocked = () => setBlocked(true);
    window.addEventListener(EVENT, onBlocked);
    return () => window.removeEventListener(EVENT, onBlocked);
  }, []);
  return { blocked, dismiss: () => setBlocked(false) };
}
