import type { ButtonHTMLAttributes } from "react";

const variants = {
  primary: "bg-pine-700 text-white hover:bg-pine-800",
  secondary: "border border-ink-300 bg-white text-ink-900 hover:bg-sand-100",
  danger: "bg-danger-700 text-white hover:opacity-90",
  quiet: "text-pine-700 hover:underline",
} as const;

export function buttonClass(variant: keyof typeof variants = "primary") {
  return `inline-flex items-center justify-center gap-2 rounded-md px-3.5 py-2 text-sm font-medium disabled:opacity-50 ${variants[variant]}`;
}

export function Button({
  variant = "primary",
  className = "",
  ...props
}: { variant?: keyof typeof variants } & ButtonHTMLAttributes<HTMLButtonElement>) {
  return <button className={`${buttonClass(variant)} ${className}`} {...props} />;
}
