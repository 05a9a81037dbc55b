import type { ReactNode } from "react";

/** A side panel that can be folded away (a native details element: keyboard and reader friendly). */
export function Panel({ title, open, children }: { title: string; open?: boolean; children: ReactNode }) {
  return (
    <details className="group rounded-md border border-ink-300/70 bg-white" open={open}>
      <summary className="cursor-pointer list-none rounded-md px-3 py-2 text-sm font-semibold text-ink-900 hover:bg-sand-100">
        <span className="mr-1 inline-block transition-transform group-open:rotate-90" aria-hidden="true">
          ▸
        </span>
        {title}
      </summary>
      <div className="space-y-3 border-t border-sand-200 px-3 py-3">{children}</div>
    </details>
  );
}
