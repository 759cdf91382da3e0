import type { ReactNode } from "react";

type Tone = "info" | "caution" | "fault" | "ok";
const TONES: Record<Tone, string> = {
  info: "border-ink/30 bg-paper-deep/60 text-ink",
  caution: "border-caution bg-caution-soft text-ink",
  fault: "border-fault bg-fault-soft text-fault",
  ok: "border-sage bg-sage-soft text-ink",
};

export function Notice({ tone = "info", title, children }: { tone?: Tone; title?: ReactNode; children?: ReactNode }) {
  return (
    <div role={tone === "fault" ? "alert" : "status"} className={`rounded-sheet border-l-4 px-4 py-3 text-sm ${TONES[tone]}`}>
      {title && <p className="font-semibold">{title}</p>}
      {children && <div className={title ? "mt-1" : ""}>{children}</div>}
    </div>
  );
}
