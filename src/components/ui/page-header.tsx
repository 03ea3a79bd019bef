import type { ReactNode } from "react";

type PageHeaderProps = { title: ReactNode; eyebrow?: ReactNode; description?: ReactNode; actions?: ReactNode };

/** The heading block at the top of every signed-in page. */
export function PageHeader({ title, eyebrow, description, actions }: PageHeaderProps) {
  return (
    <div className="mb-6 flex flex-wrap items-end justify-between gap-4">
      <div className="min-w-0">
        {eyebrow && <div className="mb-1 text-xs font-semibold uppercase tracking-[0.12em] text-well-500">{eyebrow}</div>}
        <h1 className="text-2xl font-semibold tracking-[-0.015em] text-ink sm:text-[1.7rem]">{title}</h1>
        {description && <p className="mt-1.5 max-w-2xl text-[0.95rem] text-ink-soft">{description}</p>}
      </div>
      {actions && <div className="flex flex-wrap items-center gap-2">{actions}</div>}
    </div>
  );
}
