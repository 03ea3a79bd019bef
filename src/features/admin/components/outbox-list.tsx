import { Link } from "react-router-dom";
import type { OutboxMessage } from "../../../../shared/schemas";
import { cn } from "../../../lib/cn";
import { formatDateTime } from "../../../lib/format";

type OutboxListProps = { messages: OutboxMessage[]; openId?: string; linkFor: (id: string) => string };

/** Newest first; the open message is highlighted. */
export function OutboxList({ messages, openId, linkFor }: OutboxListProps) {
  return (
    <ul className="divide-y divide-line">
      {messages.map((m) => (
        <li key={m.id}>
          <Link
            to={linkFor(m.id)}
            aria-current={m.id === openId ? "true" : undefined}
            className={cn(
              "block border-l-[3px] px-5 py-3 transition-colors hover:bg-well-50",
              m.id === openId ? "border-l-ember-400 bg-well-50" : "border-l-transparent",
            )}
          >
            <div className="flex items-baseline justify-between gap-3">
              <p className="min-w-0 truncate text-sm font-medium text-ink">{m.subject}</p>
              <time dateTime={m.createdAt} className="shrink-0 text-xs text-ink-faint">
                {formatDateTime(m.createdAt)}
              </time>
            </div>
            <p className="mt-0.5 truncate text-xs text-ink-soft">to {m.to}</p>
          </Link>
        </li>
      ))}
    </ul>
  );
}
