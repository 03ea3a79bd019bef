import type { OutboxMessage as Message } from "../../../../shared/schemas";
import { formatDateTime } from "../../../lib/format";
import { LinkifiedText } from "./linkified-text";

/** One caught e-mail, shown as its plain-text part with clickable links. */
export function OutboxMessage({ message }: { message: Message }) {
  return (
    <article aria-label={`E-mail: ${message.subject}`}>
      <header className="border-b border-line px-5 py-4">
        <h2 className="text-base font-semibold text-ink">{message.subject}</h2>
        <dl className="mt-2 grid grid-cols-[auto_1fr] gap-x-3 gap-y-0.5 text-xs text-ink-soft">
          <dt className="text-ink-faint">From</dt>
          <dd className="break-all">{message.from}</dd>
          <dt className="text-ink-faint">To</dt>
          <dd className="break-all">{message.to}</dd>
          <dt className="text-ink-faint">Sent</dt>
          <dd>{formatDateTime(message.createdAt)}</dd>
        </dl>
      </header>
      <div className="px-5 py-4">
        <LinkifiedText text={message.text} />
      </div>
    </article>
  );
}
