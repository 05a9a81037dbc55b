import { useSyncExternalStore, type ReactNode } from "react";

const subscribe = () => () => {};

/** True once the page runs in the browser (false during server rendering and hydration). */
export function useHydrated(): boolean {
  return useSyncExternalStore(
    subscribe,
    () => true,
    () => false,
  );
}

/** Renders its children only in the browser; the fallback on the server and while hydrating. */
export function ClientOnly({ children, fallback }: { children: () => ReactNode; fallback: ReactNode }) {
  return useHydrated() ? children() : fallback;
}

/** Stands in for the plan canvas until its code has loaded in the browser. */
export function CanvasPlaceholder({ text = "Loading the plan…" }: { text?: string }) {
  return <div className="flex h-full items-center justify-center text-sm text-ink-500">{text}</div>;
}
