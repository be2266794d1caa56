'use client';

import { useSyncExternalStore } from 'react';

const noSubscription = () => () => {};

/**
 * False while the server renders and during hydration, true in the browser afterwards: for parts that
 * measure the page (charts), without setting state in an effect.
 */
export const useHydrated = (): boolean =>
  useSyncExternalStore(
    noSubscription,
    () => true,
    () => false,
  );
