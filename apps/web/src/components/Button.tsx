import type { ButtonHTMLAttributes } from "react";

export type ButtonVariant = "primary" | "accent" | "secondary" | "danger" | "ghost";
export type ButtonSize = "sm" | "md";

const variantClasses: Record<ButtonVariant, string> = {
  primary: "bg-ink-800 text-paper-50 hover:bg-ink-700 disabled:bg-ink-300",
  accent: "bg-ochre-400 text-ink-950 hover:bg-ochre-300 disabled:bg-ochre-100 disabled:text-paper-500",
  secondary:
    "border border-paper-300 bg-white text-ink-800 hover:border-ink-300 hover:bg-paper-50 disabled:text-paper-400",
  danger: "bg-danger-600 text-white hover:bg-danger-700 disabled:bg-danger-200",
  ghost: "text-ink-700 hover:bg-paper-200 disabled:text-paper-400",
};

const sizeClasses: Record<ButtonSize, string> = {
  sm: "h-8 px-3 text-sm",
  md: "h-10 px-4 text-base",
};

export function buttonClasses(variant: ButtonVariant = "primary", size: ButtonSize = "md"): string {
  return [
    "inline-flex items-center justify-center gap-2 rounded-md font-medium transition-colors",
    "disabled:cursor-not-allowed",
    variantClasses[variant],
    sizeClasses[size],
  ].join(" ");
}

export interface ButtonProps extends ButtonHTMLAttributes<HTMLButtonElement> {
  variant?: ButtonVariant;
  size?: ButtonSize;
  /** Shows a busy label and blocks a second submit while a request is in flight. */
  busy?: boolean;
  busyLabel?: string;
}

export function Button({
  variant = "primary",
  size = "md",
  busy = false,
  busyLabel,
  className,
  children,
  disabled,
  type = "button",
  ...rest
}: ButtonProps) {
  return (
    <button
      type={type}
      className={`${buttonClasses(variant, size)} ${className ?? ""}`}
      disabled={disabled === true || busy}
      aria-busy={busy || undefined}
      {...rest}
    >
      {busy && busyLabel !== undefined ? busyLabel : children}
    </button>
  );
}
