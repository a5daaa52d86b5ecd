import { useCallback, useState } from 'react';

/** Where a position request stands; `refused` and `unavailable` say why manual entry is offered. */
export type GeoState =
  | { status: 'idle' }
  | { status: 'locating' }
  | { status: 'found'; latitude: number; longitude: number; accuracyM: number }
  | { status: 'refused' | 'unavailable' | 'timeout'; message: string };

/** Asks the device for one position fix, on demand (never in the background). */
export function useGeolocation(): { state: GeoState; locate: () => void } {
  const [state, setState] = useState<GeoState>({ status: 'idle' });
  const locate = useCallback(() => {
    if (!('geolocation' in navigator)) {
      setState({ status: 'unavailable', message: 'no geolocation' });
      return;
    }
    setState({ status: 'locating' });
    navigator.geolocation.getCurrentPosition(
      (position) =>
        setState({ status: 'found', latitude: position.coords.latitude, longitude: position.coords.longitude, accuracyM: position.coords.accuracy }),
      (error) => {
        const status = error.code === error.PERMISSION_DENIED ? 'refused' : error.code === error.TIMEOUT ? 'timeout' : 'unavailable';
        setState({ status, message: error.message });
      },
      { enableHighAccuracy: true, timeout: 20_000, maximumAge: 60_000 },
    );
  }, []);
  return { state, locate };
}
