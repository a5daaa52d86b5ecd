import { lazy, Suspense, type ComponentType } from 'react';

/**
 * Loads a screen in its own chunk so the first paint stays small. The fallback is empty on purpose:
 * Ionic's outlet waits for the screen's IonPage, and an interim IonPage would confuse its transition.
 */
export function lazyPage(load: () => Promise<{ default: ComponentType }>): ComponentType {
  const Page = lazy(load);
  return function LazyPage() {
    return (
      <Suspense fallback={null}>
        <Page />
      </Suspense>
    );
  };
}
