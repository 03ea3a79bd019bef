import { useState, type FormEvent } from "react";
import { cn } from "../../lib/cn";
import { controlClass } from "./field";

type SearchBoxProps = { value: string; onSearch: (q: string) => void; label: string; placeholder?: string; className?: string };

/** A search field that applies on Enter (and when cleared), so each search is one request. */
export function SearchBox({ value, onSearch, label, placeholder, className }: SearchBoxProps) {
  const [draft, setDraft] = useState(value);
  const submit = (e: FormEvent) => {
    e.preventDefault();
    onSearch(draft.trim());
  };
  return (
    <form role="search" onSubmit={submit} className={cn("relative w-full sm:w-72", className)}>
      <label className="sr-only" htmlFor="search-box">
        {label}
      </label>
      <svg viewBox="0 0 20 20" aria-hidden="true" className="pointer-events-none absolute top-1/2 left-3 h-4 w-4 -translate-y-1/2 text-ink-faint">
        <circle cx="8.5" cy="8.5" r="5.5" fill="none" stroke="currentColor" strokeWidth="1.8" />
        <path d="m13 13 4 4" stroke="currentColor" strokeWidth="1.8" strokeLinecap="round" />
      </svg>
      <input
        id="search-box"
        type="search"
        value={draft}
        placeholder={placeholder}
        onChange={(e) => {
          setDraft(e.target.value);
          if (e.target.value === "" && value !== "") onSearch("");
        }}
        className={cn(controlClass(false), "pl-9")}
      />
    </form>
  );
}
