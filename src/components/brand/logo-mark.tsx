import { cn } from "../../lib/cn";

type LogoMarkProps = { className?: string; title?: string };

/**
 * Equilibrist's mark: a potential well with a ball settled at its floor (a stable
 * equilibrium) and a hollow ring perched on the rim (an unstable one).
 */
export function LogoMark({ className, title = "Equilibrist" }: LogoMarkProps) {
  return (
    <svg viewBox="0 0 32 32" role="img" aria-label={title} className={cn("h-8 w-8", className)}>
      <path
        d="M2.5 9.5c4.2 0 6.2 3.4 8.3 9.2C12.4 23 14 25.4 16 25.4s3.6-2.4 5.2-6.7c2.1-5.8 4.1-9.2 8.3-9.2"
        fill="none"
        stroke="currentColor"
        strokeWidth="2.2"
        strokeLinecap="round"
      />
      <circle cx="16" cy="20.3" r="3.7" className="fill-ember-400" />
      <circle cx="5.6" cy="6.6" r="1.9" fill="none" stroke="currentColor" strokeWidth="1.3" opacity="0.75" />
    </svg>
  );
}

/** The mark beside the product name, as used in the top bar and on the sign-in pages. */
export function Wordmark({ className, tone = "light" }: { className?: string; tone?: "light" | "dark" }) {
  return (
    <span className={cn("inline-flex items-center gap-2", className)}>
      <LogoMark className={tone === "light" ? "text-well-300" : "text-well-700"} title="" />
      <span
        className={cn(
          "text-[1.05rem] font-semibold tracking-[-0.01em]",
          tone === "light" ? "text-white" : "text-well-900",
        )}
      >
        Equilibrist
      </span>
    </span>
  );
}
