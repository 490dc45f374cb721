import type { ButtonHTMLAttributes } from "react";

type Variant = "primary" | "secondary";

const styles: Record<Variant, string> = {
  primary: "bg-ink text-ground hover:bg-ink-soft disabled:bg-ink/60",
  secondary: "border-2 border-ink/80 bg-transparent text-ink hover:bg-ground-sunk disabled:opacity-60",
};

export function Button({
  variant = "primary",
  pending = false,
  className = "",
  children,
  ...props
}: ButtonHTMLAttributes<HTMLButtonElement> & { variant?: Variant; pending?: boolean }) {
  return (
    <button
      {...props}
      disabled={pending || props.disabled}
      aria-busy={pending || undefined}
      className={
        `inline-flex min-h-12 items-center justify-center gap-2 rounded-md px-5 ` +
        `py-2 text-base font-bold transition-colors disabled:cursor-not-allowed ` +
        `${styles[variant]} ${className}`
      }
    >
      {pending && (
        <span
          className="h-4 w-4 animate-spin rounded-full border-2 border-current border-r-transparent"
          aria-hidden="true"
        />
      )}
      {children}
    </button>
  );
}
