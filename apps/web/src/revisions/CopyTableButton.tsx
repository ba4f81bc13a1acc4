import { useState } from "react";
import { Button } from "../components/Button";
import { copyText } from "./copyAsTable";

type CopyState = "idle" | "copied" | "refused";

/** Copies tab-separated text built on click, so it matches what the table shows at that moment. */
export function CopyTableButton({ text, label = "Copy as table" }: { text: () => string; label?: string }) {
  const [state, setState] = useState<CopyState>("idle");
  return (
    <div className="flex items-center gap-2">
      <Button
        variant="secondary"
        size="sm"
        onClick={() => {
          void copyText(text()).then((ok) => setState(ok ? "copied" : "refused"));
        }}
      >
        {label}
      </Button>
      <span role="status" className="text-xs text-paper-600">
        {state === "copied" ? "Copied: paste into a spreadsheet." : state === "refused" ? "The browser did not allow copying." : ""}
      </span>
    </div>
  );
}
