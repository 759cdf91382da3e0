import type { ButtonHTMLAttributes } from "react";

type Tone = "primary" | "plain" | "quiet" | "danger";

const TONES: Record<Tone, string> = {
  primary: "bg-ink text-paper hover:bg-ink-soft border border-ink",
  plain: "bg-paper text-ink border border-ink/60 hover:bg-paper-deep",
  quiet: "bg-transparent text-ink-soft border border-transparent hover:text-ink hover:border-paper-edge",
  danger: "bg-paper text-fault border border-fault/60 hover:bg-fault-soft",
};

export function Button({ tone = "primary", className = "", ...rest }: ButtonHTMLAttributes<HTMLButtonElement> & { tone?: Tone }) {
  return (
    <button
      {...rest}
      className={`inline-flex items-center justify-center gap-2 rounded-sheet px-3.5 py-2 text-sm font-medium transition-colors disabled:cursor-not-allowed disabled:opacity-50 ${TONES[tone]} ${className}`}
    />
  );
}
