import { useEffect, useId, useRef, useState } from "react";
import { useNavigate } from "react-router";
import type { User } from "@spanwright/contracts";
import { useSignOut } from "../api/auth";
import { describeError } from "../api/client";

function initialsOf(name: string): string {
  const parts = name.trim().split(/\s+/).filter((p) => p !== "");
  const letters = parts.length > 1 ? [parts[0], parts[parts.length - 1]] : [parts[0]];
  return letters.map((p) => p?.[0]?.toUpperCase() ?? "").join("") || "?";
}

/** A disclosure (not an ARIA menu): a button that shows who is signed in and a sign-out action. */
export function UserMenu({ user }: { user: User }) {
  const [open, setOpen] = useState(false);
  const panelId = useId();
  const rootRef = useRef<HTMLDivElement>(null);
  const signOut = useSignOut();
  const navigate = useNavigate();

  useEffect(() => {
    if (!open) return;
    const close = (event: MouseEvent | KeyboardEvent) => {
      if (event instanceof KeyboardEvent ? event.key === "Escape" : !rootRef.current?.contains(event.target as Node)) {
        setOpen(false);
      }
    };
    document.addEventListener("mousedown", close);
    document.addEventListener("keydown", close);
    return () => {
      document.removeEventListener("mousedown", close);
      document.removeEventListener("keydown", close);
    };
  }, [open]);

  return (
    <div ref={rootRef} className="relative">
      <button
        type="button"
        aria-expanded={open}
        aria-controls={panelId}
        onClick={() => setOpen((v) => !v)}
        className="flex items-center gap-2 rounded-md px-2 py-1 text-sm text-paper-100 hover:bg-ink-800"
      >
        <span
          aria-hidden="true"
          className="grid size-7 place-items-center rounded-full bg-ochre-400 text-xs font-semibold text-ink-950"
        >
          {initialsOf(user.name)}
        </span>
        <span className="hidden sm:inline">{user.name}</span>
        <span aria-hidden="true" className="text-paper-400">▾</span>
      </button>
      {open && (
        <div
          id={panelId}
          className="on-light absolute right-0 z-20 mt-2 w-64 rounded-lg border border-paper-300 bg-white p-2 text-ink-900 shadow-card"
        >
          <div className="px-3 py-2">
            <p className="text-sm font-semibold">{user.name}</p>
            <p className="truncate text-xs text-paper-600">{user.email}</p>
          </div>
          <hr className="my-1 border-paper-200" />
          <button
            type="button"
            className="w-full rounded-md px-3 py-2 text-left text-sm hover:bg-paper-100"
            disabled={signOut.isPending}
            onClick={() =>
              signOut.mutate(undefined, { onSuccess: () => void navigate("/sign-in", { replace: true }) })
            }
          >
            {signOut.isPending ? "Signing out…" : "Sign out"}
          </button>
          {signOut.isError && (
            <p role="alert" className="px-3 py-1 text-xs text-danger-700">
              {describeError(signOut.error)}
            </p>
          )}
        </div>
      )}
    </div>
  );
}
