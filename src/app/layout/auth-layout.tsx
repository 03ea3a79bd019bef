import type { ReactNode } from "react";
import { Link } from "react-router-dom";
import { Landscape } from "../../components/brand/landscape";
import { Wordmark } from "../../components/brand/logo-mark";

type AuthLayoutProps = { title: string; subtitle?: ReactNode; children: ReactNode; footer?: ReactNode };

/** Two panes for the signed-out pages: the idea on the left, the form on the right. */
export function AuthLayout({ title, subtitle, children, footer }: AuthLayoutProps) {
  return (
    <div className="min-h-screen lg:grid lg:grid-cols-[minmax(0,1.05fr)_minmax(0,1fr)]">
      <aside className="relative hidden flex-col justify-between overflow-hidden bg-well-900 px-12 py-10 text-well-100 lg:flex">
        <Link to="/" aria-label="Equilibrist home">
          <Wordmark />
        </Link>
        <div>
          <Landscape className="mb-10 max-w-xl" />
          <h2 className="max-w-md text-[1.75rem] leading-tight font-semibold text-white">
            Know where your network settles before you build on it.
          </h2>
          <p className="mt-4 max-w-md text-[0.95rem] leading-relaxed text-well-200">
            Maps over relaxation rate μ and asymmetry τ: how many verified fixed points random networks reach,
            how many are stable, and how that compares with the Kac–Rice prediction.
          </p>
        </div>
        <p className="font-mono text-xs text-well-400">dx/dt = −μx + f(x)</p>
      </aside>
      <main className="flex min-h-screen flex-col px-5 py-8 sm:px-10 lg:min-h-0 lg:justify-center">
        <div className="mb-10 lg:hidden">
          <Link to="/" aria-label="Equilibrist home" className="inline-flex rounded-lg bg-well-900 px-3 py-2">
            <Wordmark />
          </Link>
        </div>
        <div className="mx-auto w-full max-w-sm">
          <h1 className="text-2xl font-semibold tracking-[-0.015em] text-ink">{title}</h1>
          {subtitle && <p className="mt-1.5 text-[0.95rem] text-ink-soft">{subtitle}</p>}
          <div className="mt-7">{children}</div>
          {footer && <div className="mt-6 border-t border-line pt-5 text-sm text-ink-soft">{footer}</div>}
        </div>
      </main>
    </div>
  );
}
