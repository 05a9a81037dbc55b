import { Button } from "~/components/ui/button";
import type { DraftBackup } from "./use-draft-backup";

/** Someone saved meanwhile: reload theirs (ours stays one undo step back) or save ours as a copy. */
export function ConflictDialog({
  message,
  busy,
  onReload,
  onCopy,
  onClose,
}: {
  message: string;
  busy: boolean;
  onReload(): void;
  onCopy(): void;
  onClose(): void;
}) {
  return (
    <div
      role="alertdialog"
      aria-modal="true"
      aria-labelledby="conflict-title"
      aria-describedby="conflict-text"
      className="fixed inset-0 z-50 flex items-center justify-center bg-ink-900/40 p-4"
    >
      <div className="max-w-lg rounded-lg bg-white p-5 shadow-xl">
        <h2 id="conflict-title" className="text-lg font-semibold">
          Someone else saved this layout
        </h2>
        <p id="conflict-text" className="mt-2 text-sm text-ink-700">
          {message}
        </p>
        <div className="mt-4 flex flex-wrap justify-end gap-2">
          <Button variant="secondary" onClick={onClose} disabled={busy}>
            Keep editing
          </Button>
          <Button variant="secondary" onClick={onReload} disabled={busy}>
            Reload the saved version
          </Button>
          <Button onClick={onCopy} disabled={busy} autoFocus>
            Save as a copy
          </Button>
        </div>
      </div>
    </div>
  );
}

/** Unsaved changes from an earlier visit were found in this browser. */
export function RestoreBanner({
  backup,
  onRestore,
  onDiscard,
}: {
  backup: DraftBackup;
  onRestore(): void;
  onDiscard(): void;
}) {
  const when = new Date(backup.savedAt).toLocaleString();
  return (
    <div
      role="alert"
      className="flex flex-wrap items-center gap-3 rounded-md border border-clay-500 bg-clay-100 px-3 py-2 text-sm text-clay-700"
    >
      <span>Unsaved changes from {when} were kept in this browser.</span>
      <span className="ml-auto flex gap-2">
        <Button onClick={onRestore}>Bring them back</Button>
        <Button variant="secondary" onClick={onDiscard}>
          Discard them
        </Button>
      </span>
    </div>
  );
}
