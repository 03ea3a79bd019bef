import { plural } from "../../lib/format";
import { Button } from "./button";

type PagerProps = {
  offset: number;
  limit: number;
  total: number;
  onOffset: (offset: number) => void;
  /** Singular noun: "account" gives "1 account", "3 accounts". */
  noun: string;
};

/** "21–40 of 113 users" with previous / next. Hidden when everything fits on one page. */
export function Pager({ offset, limit, total, onOffset, noun }: PagerProps) {
  if (total <= limit && offset === 0) {
    return <p className="px-5 py-3 text-xs text-ink-faint">{plural(total, noun)}</p>;
  }
  const first = total === 0 ? 0 : offset + 1;
  const last = Math.min(total, offset + limit);
  return (
    <div className="flex items-center justify-between gap-3 px-5 py-3">
      <p className="text-xs text-ink-faint">{`${first}–${last} of ${plural(total, noun)}`}</p>
      <div className="flex gap-2">
        <Button variant="secondary" size="sm" disabled={offset === 0} onClick={() => onOffset(Math.max(0, offset - limit))}>
          Previous
        </Button>
        <Button variant="secondary" size="sm" disabled={last >= total} onClick={() => onOffset(offset + limit)}>
          Next
        </Button>
      </div>
    </div>
  );
}
