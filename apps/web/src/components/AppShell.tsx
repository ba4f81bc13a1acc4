import { Link, NavLink, Outlet, useNavigation } from "react-router";
import type { User } from "@spanwright/contracts";
import { OutboxLink } from "../outbox/OutboxLink";
import { Caution } from "./Caution";
import { Wordmark } from "./Logo";
import { UserMenu } from "./UserMenu";
import { usePrefetchEditor } from "../prefetchEditor";

function navLinkClasses({ isActive }: { isActive: boolean }): string {
  return `rounded-md px-3 py-1.5 text-sm ${isActive ? "bg-ink-700 text-paper-50" : "text-paper-300 hover:text-paper-50"}`;
}

/** Header, page body and footer for everything behind sign-in. */
export function AppShell({ user }: { user: User }) {
  usePrefetchEditor();
  const navigation = useNavigation();
  return (
    <div className="flex min-h-screen flex-col">
      <a
        href="#main"
        className="sr-only focus:not-sr-only focus:absolute focus:left-4 focus:top-2 focus:z-30 focus:rounded-md focus:bg-ochre-400 focus:px-3 focus:py-1 focus:text-ink-950"
      >
        Skip to content
      </a>
      <header className="on-dark bg-ink-900 text-paper-50">
        <div className="mx-auto flex h-14 max-w-7xl items-center gap-6 px-6">
          <Link to="/projects" aria-label="Spanwright, your projects" className="rounded-md">
            <Wordmark tone="light" />
          </Link>
          <nav aria-label="Main" className="flex-1">
            <NavLink
              to="/projects"
              end
              className={navLinkClasses}
            >
              Projects
            </NavLink>
            <OutboxLink className={navLinkClasses} />
          </nav>
          <UserMenu user={user} />
        </div>
        <div
          aria-hidden="true"
          className={`h-0.5 bg-ochre-400 transition-opacity ${navigation.state === "idle" ? "opacity-0" : "opacity-100 motion-safe:animate-pulse"}`}
        />
      </header>
      <main id="main" className="mx-auto w-full max-w-7xl flex-1 px-6 py-8">
        <Outlet />
      </main>
      <footer className="border-t border-paper-300 bg-paper-50">
        <div className="mx-auto max-w-7xl px-6 py-4">
          <Caution />
        </div>
      </footer>
    </div>
  );
}
