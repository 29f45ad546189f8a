import type { ComponentProps } from "react";

type Variant = "primary" | "secondary" | "danger" | "ghost";

const VARIANTS: Record<Variant, string> = {
  primary: "bg-frost-400 text-ink-950 hover:bg-frost-300",
  secondary: "border border-ink-600 bg-ink-800 text-ink-100 hover:border-ink-400 hover:bg-ink-700",
  danger: "border border-fault-400 bg-fault-900 text-fault-200 hover:bg-fault-500 hover:text-ink-950",
  ghost: "text-ink-200 hover:bg-ink-800 hover:text-ink-50",
};

export function buttonClass(variant: Variant = "primary", size: "md" | "sm" = "md") {
  const sizing = size === "sm" ? "px-2.5 py-1 text-sm" : "px-4 py-2";
  return `inline-flex items-center justify-center gap-2 rounded-md font-medium transition-colors disabled:cursor-not-allowed disabled:opacity-60 ${sizing} ${VARIANTS[variant]}`;
}

type ButtonProps = ComponentProps<"button"> & { variant?: Variant; size?: "md" | "sm"; busy?: boolean };

/** busy keeps the label (screen readers hear aria-busy) and blocks a second submit. */
export function Button({ variant = "primary", size = "md", busy = false, className = "", disabled, type = "button", children, ...rest }: ButtonProps) {
  return (
    <button type={type} className={`${buttonClass(variant, size)} ${className}`} disabled={disabled || busy} aria-busy={busy || undefined} {...rest}>
      {busy ? <span className="size-3.5 animate-spin rounded-full border-2 border-current border-r-transparent" aria-hidden="true" /> : null}
      {children}
    </button>
  );
}
