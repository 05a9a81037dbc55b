import { useEffect, useRef } from "react";
import { useBlocker } from "react-router";
import { Button } from "~/components/ui/button";

/**
 * Asks before leaving with unsaved changes: in-app links go through the router's blocker (our own
 * dialog), closing or reloading the tab through the browser's own prompt.
 * @returns the blocker and a way to let one navigation through (after "save as a copy").
 */
export function useLeaveGuard(dirty: boolean) {
  const dirtyRef = useRef(dirty);
  useEffect(() => {
    dirtyRef.current = dirty;
  }, [dirty]);
  const allowOnce = useRef(false);
  const blocker = useBlocker(({ currentLocation, nextLocation }) => {
    if (allowOnce.current) {
      allowOnce.current = false;
      return false;
    }
    return dirtyRef.current && currentLocation.pathname !== nextLocation.pathname;
  });
  useEffect(() => {
    const onBeforeUnload = (e: BeforeUnloadEvent) => {
      if (!dirtyRef.current) return;
      e.preventDefault();
      e.returnValue = "";
    };
    window.addEventListener("beforeunload", onBeforeUnload);
    return () => window.removeEventListener("beforeunload", onBeforeUnload);
  }, []);
  return {
    blocker,
    allowNextNavigation() {
      allowOnce.current = true;
    },
  };
}

export function LeaveDialog({ blocker }: { blocker: ReturnType<typeof useBlocker> }) {
  if (blocker.state !== "blocked") return null;
  return (
    <div
      role="alertdialog"
      aria-modal="true"
      aria-labelledby="leave-title"
      className="fixed inset-0 z-50 flex items-center justify-center bg-ink-900/40 p-4"
    >
      <div className="max-w-md rounded-lg bg-white p-5 shadow-xl">
        <h2 id="leave-title" className="text-lg font-semibold">
          Leave without saving?
        </h2>
        <p className="mt-2 text-sm text-ink-700">
          The drawing has changes that are not saved as a version yet. This browser keeps a copy, but other
          directors will not see them.
        </p>
        <div className="mt-4 flex flex-wrap justify-end gap-2">
          <Button variant="secondary" autoFocus onClick={() => blocker.reset()}>
            Stay and keep editing
          </Button>
          <Button variant="danger" onClick={() => blocker.proceed()}>
            Leave without saving
          </Button>
        </div>
      </div>
    </div>
  );
}
