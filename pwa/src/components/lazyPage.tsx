import { lazy, Suspense, type ComponentType } from 'react';

/**
 * Loads a top-level screen (the signed-in area, the set-password page) in its own chunk so the first
 * paint stays small. The fallback is empty: the chunks are precached, so the wait is short, and the
 * sign-in page waits for the signed-in area's chunk before it leads there (features/navigation/appArea).
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
