import type { ButtonHTMLAttributes } from "react";
import { Link, type LinkProps } from "react-router";
import { cx } from "./cx";

type Variant = "primary" | "secondary" | "ghost" | "onDark";
type Size = "md" | "lg";

const base =
  "inline-flex items-center justify-center gap-2 rounded-md font-semibold transition-colors " +
  "disabled:cursor-not-allowed disabled:opacity-60 focus-visible:outline-3 focus-visible:outline-offset-2";

const variants: Record<Variant, string> = {
  // Dark text on ember: hot metal, and 6:1 contrast.
  primary: "bg-ember-500 text-soot-950 hover:bg-ember-400 shadow-[0_1px_0_rgb(255_255_255/0.25)_inset]",
  secondary: "border border-soot-700/25 bg-white text-soot-900 hover:border-soot-700/50 hover:bg-bone-100",
  ghost: "text-quench-700 hover:bg-quench-100 hover:text-quench-800",
  onDark: "border border-ash-300/40 text-bone-50 hover:border-ember-300 hover:text-ember-200",
};

const sizes: Record<Size, string> = {
  md: "min-h-10 px-4 text-sm",
  lg: "min-h-12 px-6 text-base",
};

export function buttonClasses(variant: Variant = "primary", size: Size = "md", extra?: string): string {
  return cx(base, variants[variant], sizes[size], extra);
}

interface ButtonProps extends ButtonHTMLAttributes<HTMLButtonElement> {
  variant?: Variant;
  size?: Size;
}

export function Button({ variant, size, className, type = "button", ...rest }: ButtonProps) {
  return <button type={type} className={buttonClasses(variant, size, className)} {...rest} />;
}

interface ButtonLinkProps extends LinkProps {
  variant?: Variant;
  size?: Size;
}

export function ButtonLink({ variant, size, className, ...rest }: ButtonLinkProps) {
  return <Link className={buttonClasses(variant, size, typeof className === "string" ? className : undefined)} {...rest} />;
}
