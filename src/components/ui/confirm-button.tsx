import { useState, type ReactNode } from "react";
import { Button, type ButtonSize, type ButtonVariant } from "./button";

type ConfirmButtonProps = {
  children: ReactNode;
  /** The question shown after the first click, e.g. "Remove Ada?". */
  question: string;
  confirmLabel: string;
  onConfirm: () => void;
  busy?: boolean;
  variant?: ButtonVariant;
  size?: ButtonSize;
};

/** A destructive action that asks once, in place, before it runs. */
export function ConfirmButton({ children, question, confirmLabel, onConfirm, busy, variant = "ghost", size = "sm" }: ConfirmButtonProps) {
  const [asking, setAsking] = useState(false);
  if (!asking) {
    return (
      <Button variant={variant} size={size} onClick={() => setAsking(true)} busy={busy}>
        {children}
      </Button>
    );
  }
  return (
    <span className="inline-flex flex-wrap items-center gap-2" role="group" aria-label={question}>
      <span className="text-sm text-ink-soft">{question}</span>
      <Button
        variant="danger"
        size={size}
        busy={busy}
        onClick={() => {
          setAsking(false);
          onConfirm();
        }}
      >
        {confirmLabel}
      </Button>
      <Button variant="secondary" size={size} onClick={() => setAsking(false)}>
        Cancel
      </Button>
    </span>
  );
}
