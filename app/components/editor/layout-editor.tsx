/**
 * The layout editor: the plan canvas (loaded in the browser only), the drawing tools, the panels
 * and the live analysis. State lives in one reducer (app/lib/editor/editor-state.ts, through
 * useEditorDocument); the canvas and the panels only dispatch changes.
 */
import { useState } from "react";
import type { LayoutDocument } from "~/analysis";
import { photoUrl } from "~/components/drawing/drawing-title";
import { isDirty } from "~/lib/editor/editor-state";
import { canRedo, canUndo } from "~/lib/editor/history";
import { ClosureBar } from "./closure-bar";
import { ConflictDialog, RestoreBanner } from "./editor-dialogs";
import { EditorHeader } from "./editor-header";
import { EditorPanels } from "./editor-panels";
import { EditorToolbar } from "./editor-toolbar";
import { LazyDrawingCanvas } from "./lazy-drawing-canvas";
import { useAnalysis, type Skill } from "./use-analysis";
import { useDraftBackup } from "./use-draft-backup";
import { useEditorCommands, useEditorShortcuts, useEditorTools } from "./use-editor-commands";
import { useEditorDocument } from "./use-editor-document";
import { LeaveDialog, useLeaveGuard } from "./use-leave-guard";
import { useSave } from "./use-save";

export interface LayoutEditorProps {
  club: { id: string; name: string };
  layout: { id: string; name: string; status: string };
  document: LayoutDocument;
  version: number;
}

export function LayoutEditor({ club, layout, document, version }: LayoutEditorProps) {
  const ed = useEditorDocument(document, version);
  const { state, dispatch, doc, sections, selected } = ed;
  const tools = useEditorTools();
  const [classId, setClassId] = useState<string | undefined>(doc.carClasses[0]);
  const [skill, setSkill] = useState<Skill>("club");
  const analysis = useAnalysis(doc, classId, skill, layout.id);
  const dirty = isDirty(state);
  const guard = useLeaveGuard(dirty);
  const backup = useDraftBackup(layout.id, doc, dirty, state.baseVersion, document);
  const saver = useSave({
    layoutId: layout.id,
    present: doc,
    baseVersion: state.baseVersion,
    onSaved: ed.onSaved,
    onReloaded: ed.onReloaded,
    beforeLeave: guard.allowNextNavigation,
  });
  const commands = useEditorCommands(ed, tools);
  const blocked = guard.blocker.state === "blocked" || saver.outcome.kind === "conflict";
  useEditorShortcuts(ed, tools, saver.save, !blocked);

  return (
    <div className="space-y-3">
      <EditorHeader
        club={club}
        layoutId={layout.id}
        name={doc.name}
        saver={saver}
        dirty={dirty}
        baseVersion={state.baseVersion}
      />
      {backup.found ? (
        <RestoreBanner
          backup={backup.found}
          onRestore={() => {
            ed.change(backup.found!.document);
            backup.dismiss();
          }}
          onDiscard={backup.dismiss}
        />
      ) : null}
      <EditorToolbar
        sectionSelected={selected !== null}
        canUndo={canUndo(state.history)}
        canRedo={canRedo(state.history)}
        preset={tools.preset}
        snap={tools.snap}
        units={tools.units}
        onPreset={tools.setPreset}
        onAdd={commands.add}
        onDelete={() => dispatch({ type: "delete-selected" })}
        onDuplicate={() => dispatch({ type: "duplicate-selected" })}
        onMove={commands.move}
        onUndo={() => dispatch({ type: "undo" })}
        onRedo={() => dispatch({ type: "redo" })}
        onSnap={tools.setSnap}
        onUnits={tools.setUnits}
      />
      <ClosureBar
        closure={ed.closure}
        units={tools.units}
        editable
        message={commands.closeMessage}
        onClose={commands.closeTheLoop}
      />
      {state.notice ? (
        <p role="status" className="text-sm text-clay-700">
          {state.notice}
        </p>
      ) : null}
      <div className="flex flex-col gap-3 lg:flex-row">
        <div
          className="relative h-[62vh] min-h-[380px] overflow-hidden rounded-md border border-ink-300 lg:flex-1"
          aria-label="Plan of the layout: drag handles to reshape, or use the panels and keyboard"
          role="application"
        >
          <LazyDrawingCanvas
            doc={doc}
            sections={sections}
            selection={state.selection}
            editable
            mode={tools.mode}
            snap={tools.snap}
            units={tools.units}
            overlay={analysis.overlay}
            overlayStale={analysis.overlayDoc !== doc}
            photoUrl={photoUrl(doc.background)}
            fitRequest={tools.fitRequest}
            calibrationPoints={tools.calibrationPoints}
            onSelect={ed.select}
            onChange={ed.change}
            onGestureEnd={ed.endGesture}
            onPlanClick={commands.planClick}
          />
        </div>
        <EditorPanels
          layoutId={layout.id}
          ed={ed}
          tools={tools}
          commands={commands}
          analysis={analysis}
          choice={{ classId, skill, setClassId, setSkill }}
        />
      </div>
      <LeaveDialog blocker={guard.blocker} />
      {saver.outcome.kind === "conflict" ? (
        <ConflictDialog
          message={saver.outcome.message}
          busy={saver.busy}
          onReload={saver.reload}
          onCopy={saver.saveCopy}
          onClose={saver.dismiss}
        />
      ) : null}
    </div>
  );
}
