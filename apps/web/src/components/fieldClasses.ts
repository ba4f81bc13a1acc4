/** Shared look of text inputs and selects; the invalid state changes border, not only colour of text. */
export function fieldClasses(invalid: boolean): string {
  return [
    "block w-full rounded-md border bg-white px-3 h-10 text-base text-ink-900",
    "placeholder:text-paper-400 disabled:bg-paper-100 disabled:text-paper-500",
    invalid ? "border-danger-600 border-2 px-[11px]" : "border-paper-300 hover:border-ink-300",
  ].join(" ");
}

/** Server and zod messages may start lower-case ("at least 10 characters"); show them as sentences. */
export function asSentence(message: string): string {
  const trimmed = message.trim();
  if (trimmed === "") return trimmed;
  return trimmed[0]?.toUpperCase() + trimmed.slice(1);
}
