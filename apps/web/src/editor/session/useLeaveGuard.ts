import { useEffect } from "react";
import { useBlocker, type Blocker } from "react-router";

/**
 * Asks before leaving with unsaved changes: the browser's own prompt on reload or tab close
 * (beforeunload), and a router blocker for in-app navigation that the page shows as a dialog.
 */
export function useLeaveGuard(isDirty: boolean): Blocker {
  useEffect(() => {
    if (!isDirty) return;
    const onBeforeUnload = (e: BeforeUnloadEvent) => {
      e.preventDefault();
      e.returnValue = ""; // older browsers need it set to show the prompt
    };
    window.addEventListener("beforeunload", onBeforeUnload);
    return () => window.removeEventListener("beforeunload", onBeforeUnload);
  }, [isDirty]);
  return useBlocker(({ currentLocation, nextLocation }) => isDirty && currentLocation.pathname !== nextLocation.pathname);
}
