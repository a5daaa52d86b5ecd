import { lazy, Suspense, type ComponentType } from 'react';

/**
 * Loads a top-level screen (the tab shell, the set-password page) in its own chunk so the first paint stays small.
 * The fallback is empty on purpose: Ionic's outlet waits for the screen's own page element, and an
 * interim IonPage would confuse its transition.
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
