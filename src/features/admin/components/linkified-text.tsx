import type { ReactNode } from "react";
import { Link } from "react-router-dom";

const URL_PATTERN = /https?:\/\/[^\s<>"')\]]+/g;

/** A link inside the app stays in the app (router navigation); anything else opens a new tab. */
function renderLink(href: string, key: number): ReactNode {
  const cleaned = href.replace(/[.,;:!?]+$/, "");
  const trailing = href.slice(cleaned.length);
  let url: URL | null = null;
  try {
    url = new URL(cleaned);
  } catch {
    return href;
  }
  const className = "break-all text-well-600 underline decoration-well-200 underline-offset-2 hover:decoration-well-600";
  const sameOrigin = typeof window !== "undefined" && url.origin === window.location.origin;
  return (
    <span key={key}>
      {sameOrigin ? (
        <Link to={`${url.pathname}${url.search}${url.hash}`} className={className}>
          {cleaned}
        </Link>
      ) : (
        <a href={cleaned} target="_blank" rel="noreferrer noopener" className={className}>
          {cleaned}
        </a>
      )}
      {trailing}
    </span>
  );
}

/** Plain e-mail text with its web addresses made clickable; everything else stays text. */
export function LinkifiedText({ text }: { text: string }) {
  const parts: ReactNode[] = [];
  let last = 0;
  let key = 0;
  for (const match of text.matchAll(URL_PATTERN)) {
    const start = match.index ?? 0;
    if (start > last) parts.push(text.slice(last, start));
    parts.push(renderLink(match[0], key++));
    last = start + match[0].length;
  }
  if (last < text.length) parts.push(text.slice(last));
  return <div className="font-mono text-[0.82rem] leading-relaxed whitespace-pre-wrap text-ink">{parts}</div>;
}
