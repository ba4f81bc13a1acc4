/** The standing caution on every page that can show calculation results. */
export const cautionText =
  "Results support, and do not replace, the judgement of a licensed engineer and the governing local building code.";

/** `onDark` for the ink panels, where the paper-toned text would lose contrast. */
export function Caution({ className, onDark = false }: { className?: string; onDark?: boolean }) {
  return (
    <p className={`text-xs leading-relaxed ${onDark ? "text-paper-300" : "text-paper-600"} ${className ?? ""}`}>
      <span className={`font-semibold ${onDark ? "text-ochre-300" : "text-caution-700"}`}>Caution: </span>
      {cautionText}
    </p>
  );
}
