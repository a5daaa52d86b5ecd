import { useLayoutEffect } from 'react';
import { announceAreaChange } from '../features/navigation/appArea';

/** The route element of one area's router for the other area's paths: hands the address over to it. */
export function AreaHandover() {
  useLayoutEffect(announceAreaChange, []);
  return null;
}
