import { Link } from "@/components/ui/link";
import type { ComponentProps } from "react";

/** destructive: for what cannot be undone (delete, remove, void); plum, never the hazard red, which means danger alone. */
type Variant = "primary" | "secondary" | "quiet" | "destructive";

const styles: Record<Variant, string> = {
  primary: "bg-glow text-glow-ink hover:brightness-110 shadow-sm",
  secondary: "bg-panel text-ink border border-rule hover:bg-sunk",
  quiet: "text-ink hover:bg-sunk",
  destructive: "bg-panel text-flag border border-flag/60 hover:bg-flag-bg",
};

const base =
  "inline-flex items-center justify-center gap-2 rounded-chip px-4 py-2 text-body font-bold transition disabled:opacity-60 disabled:cursor-not-allowed min-h-11";

export function buttonClass(variant: Variant = "primary", extra = "") {
  return `${base} ${styles[variant]} ${extra}`;
}

export function Button({ variant = "primary", className = "", ...props }: ComponentProps<"button"> & { variant?: Variant }) {
  return <button className={buttonClass(variant, className)} {...props} />;
}

export function ButtonLink({ variant = "primary", className = "", ...props }: ComponentProps<typeof Link> & { variant?: Variant }) {
  return <Link className={buttonClass(variant, className)} {...props} />;
}
