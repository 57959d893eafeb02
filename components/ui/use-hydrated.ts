import { useSyncExternalStore } from "react";

const subscribe = () => () => {};

/** False during the server render and hydration, true once the browser has taken over. */
export function useHydrated(): boolean {
  return useSyncExternalStore(
    subscribe,
    () => true,
    () => false,
  );
}
