import { DrawingTitle } from "~/components/drawing/drawing-title";
import { Button } from "~/components/ui/button";
import type { useSave } from "./use-save";

type Saver = ReturnType<typeof useSave>;

/** What the save status line says: saving, refused, unsaved changes, saved, or the version open. */
function saveText(saver: Saver, dirty: boolean, baseVersion: number): string {
  if (saver.busy) return "Saving…";
  if (saver.outcome.kind === "refused") return saver.outcome.message;
  if (dirty) return "Unsaved changes";
  if (saver.outcome.kind === "saved") return `Saved as version ${saver.outcome.version}`;
  return `Version ${baseVersion}, no unsaved changes`;
}

/** The editor's title with the way back, the save status and the two save buttons. */
export function EditorHeader({
  club,
  layoutId,
  name,
  saver,
  dirty,
  baseVersion,
}: {
  club: { id: string; name: string };
  layoutId: string;
  name: string;
  saver: Saver;
  dirty: boolean;
  baseVersion: number;
}) {
  const refused = saver.outcome.kind === "refused";
  return (
    <header className="flex flex-wrap items-center gap-x-4 gap-y-2">
      <DrawingTitle
        club={club}
        layoutId={layoutId}
        heading={`Editing ${name}`}
        links={[{ to: `/layouts/${layoutId}/plan`, label: "Read-only plan" }]}
      />
      <div className="ml-auto flex flex-wrap items-center gap-2">
        <span
          className={`text-sm ${refused ? "text-danger-700" : "text-ink-500"}`}
          role={refused ? "alert" : "status"}
          data-testid="save-status"
        >
          {saveText(saver, dirty, baseVersion)}
        </span>
        <Button variant="secondary" onClick={saver.saveCopy} disabled={saver.busy}>
          Save as a copy
        </Button>
        <Button onClick={saver.save} disabled={saver.busy || !dirty} aria-keyshortcuts="Control+S">
          Save
        </Button>
      </div>
    </header>
  );
}
