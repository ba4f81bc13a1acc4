import { LogoMark } from "./Logo";

export function FullPageLoading() {
  return (
    <div role="status" className="grid min-h-screen place-items-center bg-paper-100">
      <div className="flex flex-col items-center gap-3 text-sm text-paper-600">
        <LogoMark className="size-10 motion-safe:animate-pulse" />
        Loading Spanwright…
      </div>
    </div>
  );
}
