/**
 * The layout editor: the plan canvas (loaded in the browser only), the drawing tools, the panels
 * and the live analysis. State lives in one reducer (app/lib/editor/editor-state.ts); the canvas
 * and the panels only dispatch changes.
 */
import { lazy, Suspense, useCallback, useMemo, useReducer, useState } from "react";
import { closureError, resolveSections, sampleCentreLine, startPose } from "~/analysis";
import { closeLoop } from "~/analysis";
import { Button } from "~/components/ui/button";
import { initialPlacement, type Background } from "~/lib/editor/background";
import type { Point } from "~/lib/editor/drag-maths";
import { canRedo, canUndo } from "~/lib/editor/history";
import { editorReducer, initialEditorState, isDirty, type Selection } from "~/lib/editor/editor-state";
import {
  changeSectionKind,
  insertSection,
  moveSection,
  newSection,
  type NewSectionKind,
} from "~/lib/editor/section-ops";
import { addBoundaryPoint, addMarshalPoint, placeDriverStand } from "~/lib/editor/site-ops";
import { DEFAULT_SNAP, type SnapSettings } from "~/lib/editor/snap";
import type { LengthUnit } from "~/lib/editor/units";
import { layoutBounds } from "~/lib/editor/view";
import type { JumpPreset, LayoutDocument } from "~/analysis";
import { AnalysisPanel } from "./analysis-panel";
import type { CanvasMode } from "./canvas-types";
import { CanvasPlaceholder, ClientOnly } from "./client-only";
import { ClosureBar } from "./closure-bar";
import { DrawingTitle, photoUrl } from "~/components/drawing/drawing-title";
import { ConflictDialog, RestoreBanner } from "./editor-dialogs";
import { EditorToolbar } from "./editor-toolbar";
import { HelpPanel } from "./help-panel";
import { Panel } from "./panel";
import { PhotoPanel } from "./photo-panel";
import { SectionPanel } from "./section-panel";
import { SectionsList } from "./sections-list";
import { SitePanel } from "./site-panel";
import { useAnalysis, type Skill } from "./use-analysis";
import { useDraftBackup } from "./use-draft-backup";
import { useEditorKeys } from "./use-editor-keys";
import { LeaveDialog, useLeaveGuard } from "./use-leave-guard";
import { useSave } from "./use-save";

const DrawingCanvas = lazy(() => import("./drawing-canvas"));

export interface LayoutEditorProps {
  club: { id: string; name: string };
  layout: { id: string; name: string; status: string };
  document: LayoutDocument;
  version: number;
}

export function LayoutEditor({ club, layout, document, version }: LayoutEditorProps) {
  const [state, dispatch] = useReducer(editorReducer, undefined, () => initialEditorState(document, version));
  const doc = state.history.present;
  const sections = useMemo(() => resolveSections(doc), [doc]);
  const closure = useMemo(() => closureError(sections, startPose(doc)), [sections, doc]);
  const bounds = () => layoutBounds(doc, sampleCentreLine(sections, 1));
  const [mode, setMode] = useState<CanvasMode>("select");
  const [snap, setSnap] = useState<SnapSettings>(DEFAULT_SNAP);
  const [units, setUnits] = useState<LengthUnit>("m");
  const [preset, setPreset] = useState<JumpPreset>("tabletop");
  const [fitRequest, setFitRequest] = useState(0);
  const [calibrationPoints, setCalibrationPoints] = useState<Point[]>([]);
  const [closeMessage, setCloseMessage] = useState<string | null>(null);
  const [classId, setClassId] = useState<string | undefined>(doc.carClasses[0]);
  const [skill, setSkill] = useState<Skill>("club");
  const analysis = useAnalysis(doc, classId, skill, layout.id);
  const dirty = isDirty(state);
  const guard = useLeaveGuard(dirty);
  const backup = useDraftBackup(layout.id, doc, dirty, state.baseVersion, document);

  const change = useCallback(
    (next: LayoutDocument, gesture?: string, selection?: Selection) =>
      dispatch({ type: "change", doc: next, gesture, selection }),
    [],
  );
  const endGesture = useCallback(() => dispatch({ type: "end-gesture" }), []);
  const select = useCallback((selection: Selection) => dispatch({ type: "select", selection }), []);
  const onSaved = useCallback(
    (saved: LayoutDocument, v: number) => dispatch({ type: "saved", doc: saved, version: v }),
    [],
  );
  const onReloaded = useCallback(
    (loaded: LayoutDocument, v: number) => dispatch({ type: "reloaded", doc: loaded, version: v }),
    [],
  );
  const saver = useSave({
    layoutId: layout.id,
    present: doc,
    baseVersion: state.baseVersion,
    onSaved,
    onReloaded,
    beforeLeave: guard.allowNextNavigation,
  });

  const selected = state.selection?.kind === "section" ? state.selection.index : null;
  const add = (kind: NewSectionKind) => {
    const out = insertSection(doc, newSection(doc, kind, preset), selected);
    change(out.doc, undefined, { kind: "section", index: out.index });
  };
  const move = (step: -1 | 1) => {
    if (selected === null) return;
    const to = selected + step;
    if (to < 0 || to >= doc.sections.length) return;
    change(moveSection(doc, selected, to), undefined, { kind: "section", index: to });
  };
  const closeTheLoop = () => {
    const out = closeLoop(doc);
    if (!out.ok) return setCloseMessage(`Could not close the loop: ${out.reason}.`);
    change(out.document);
    const what = out.changes.map(
      (c) =>
        `section ${c.index + 1} ${c.field === "angleDeg" ? "angle" : c.field} ${c.from.toFixed(1)} → ${c.to.toFixed(1)}${c.field === "angleDeg" ? "°" : " m"}`,
    );
    setCloseMessage(
      what.length ? `Closed by changing ${what.join(", ")}. Undo brings the old values back.` : null,
    );
  };
  const planClick = (p: Point) => {
    if (mode === "marshal") {
      const out = addMarshalPoint(doc, p);
      if (out) change(out.doc, undefined, { kind: "marshal", index: out.index });
    } else if (mode === "boundary") {
      const out = addBoundaryPoint(doc, p);
      if (out) change(out.doc, undefined, { kind: "boundary", index: out.index });
    } else if (mode === "stand") {
      change(placeDriverStand(doc, p), undefined, { kind: "stand" });
      setMode("select");
    } else if (mode === "calibrate") {
      setCalibrationPoints((pts) => (pts.length >= 2 ? [p] : [...pts, p]));
    }
  };
  const setBackground = (bg: Background | undefined, gesture?: string) => {
    const { background: _old, ...rest } = doc;
    change(bg ? { ...rest, background: bg } : rest, gesture, bg ? { kind: "photo" } : null);
  };
  const blocked = guard.blocker.state === "blocked" || saver.outcome.kind === "conflict";
  useEditorKeys(
    {
      deleteSelected: () => dispatch({ type: "delete-selected" }),
      undo: () => dispatch({ type: "undo" }),
      redo: () => dispatch({ type: "redo" }),
      duplicate: () => dispatch({ type: "duplicate-selected" }),
      nudge: (dx, dy) => dispatch({ type: "nudge", dx, dy }),
      escape: () => {
        setMode("select");
        setCalibrationPoints([]);
        select(null);
      },
      save: saver.save,
      fit: () => setFitRequest((n) => n + 1),
    },
    !blocked,
  );

  const overlayJump =
    selected !== null
      ? analysis.overlay?.jumps.find((j) => j.sectionId === doc.sections[selected]?.id)
      : undefined;
  const saveText = saver.busy
    ? "Saving…"
    : saver.outcome.kind === "refused"
      ? saver.outcome.message
      : dirty
        ? "Unsaved changes"
        : saver.outcome.kind === "saved"
          ? `Saved as version ${saver.outcome.version}`
          : `Version ${state.baseVersion}, no unsaved changes`;

  return (
    <div className="space-y-3">
      <header className="flex flex-wrap items-center gap-x-4 gap-y-2">
        <DrawingTitle
          club={club}
          layoutId={layout.id}
          heading={`Editing ${doc.name}`}
          links={[{ to: `/layouts/${layout.id}/plan`, label: "Read-only plan" }]}
        />
        <div className="ml-auto flex flex-wrap items-center gap-2">
          <span
            className={`text-sm ${saver.outcome.kind === "refused" ? "text-danger-700" : "text-ink-500"}`}
            role={saver.outcome.kind === "refused" ? "alert" : "status"}
            data-testid="save-status"
          >
            {saveText}
          </span>
          <Button variant="secondary" onClick={saver.saveCopy} disabled={saver.busy}>
            Save as a copy
          </Button>
          <Button onClick={saver.save} disabled={saver.busy || !dirty} aria-keyshortcuts="Control+S">
            Save
          </Button>
        </div>
      </header>
      {backup.found ? (
        <RestoreBanner
          backup={backup.found}
          onRestore={() => {
            change(backup.found!.document);
            backup.dismiss();
          }}
          onDiscard={backup.dismiss}
        />
      ) : null}
      <EditorToolbar
        sectionSelected={selected !== null}
        canUndo={canUndo(state.history)}
        canRedo={canRedo(state.history)}
        preset={preset}
        snap={snap}
        units={units}
        onPreset={setPreset}
        onAdd={add}
        onDelete={() => dispatch({ type: "delete-selected" })}
        onDuplicate={() => dispatch({ type: "duplicate-selected" })}
        onMove={move}
        onUndo={() => dispatch({ type: "undo" })}
        onRedo={() => dispatch({ type: "redo" })}
        onSnap={setSnap}
        onUnits={setUnits}
      />
      <ClosureBar closure={closure} units={units} editable message={closeMessage} onClose={closeTheLoop} />
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
          <ClientOnly fallback={<CanvasPlaceholder />}>
            {() => (
              <Suspense fallback={<CanvasPlaceholder />}>
                <DrawingCanvas
                  doc={doc}
                  sections={sections}
                  selection={state.selection}
                  editable
                  mode={mode}
                  snap={snap}
                  units={units}
                  overlay={analysis.overlay}
                  overlayStale={analysis.overlayDoc !== doc}
                  photoUrl={photoUrl(doc.background)}
                  fitRequest={fitRequest}
                  calibrationPoints={calibrationPoints}
                  onSelect={select}
                  onChange={change}
                  onGestureEnd={endGesture}
                  onPlanClick={planClick}
                />
              </Suspense>
            )}
          </ClientOnly>
        </div>
        <aside
          className="space-y-2 lg:max-h-[calc(62vh+9rem)] lg:w-[22rem] lg:overflow-y-auto"
          aria-label="Editing panels"
        >
          <Panel title={selected !== null ? "Selected section" : "Sections"} open>
            {selected !== null ? (
              <SectionPanel
                doc={doc}
                index={selected}
                resolved={sections[selected]}
                snap={snap}
                overlayJump={overlayJump}
                onSection={(s, g) =>
                  change({ ...doc, sections: doc.sections.map((x, i) => (i === selected ? s : x)) }, g)
                }
                onPreset={(p) => change(changeSectionKind(doc, selected, "jump", p))}
                onGestureEnd={endGesture}
              />
            ) : (
              <p className="text-sm text-ink-500">Click a section on the plan or in the list to change it.</p>
            )}
            <SectionsList
              sections={doc.sections}
              resolved={sections}
              selected={selected}
              onSelect={(index) => select({ kind: "section", index })}
            />
          </Panel>
          <Panel title="Live analysis" open>
            <AnalysisPanel
              overlay={analysis.overlay}
              status={analysis.status}
              stale={analysis.overlayDoc !== doc}
              sections={doc.sections}
              classIds={doc.carClasses}
              classId={classId}
              skill={skill}
              selected={selected}
              onClass={setClassId}
              onSkill={setSkill}
              onSelect={(index) => select({ kind: "section", index })}
            />
          </Panel>
          <Panel
            title="Site: width, stand, marshals, boundary"
            open={
              state.selection !== null &&
              state.selection.kind !== "section" &&
              state.selection.kind !== "photo"
            }
          >
            <SitePanel
              doc={doc}
              selection={state.selection}
              mode={mode}
              bounds={bounds}
              onMode={setMode}
              onChange={change}
              onSelect={select}
              onGestureEnd={endGesture}
            />
          </Panel>
          <Panel title="Site photo" open={mode === "calibrate" || state.selection?.kind === "photo"}>
            <PhotoPanel
              layoutId={layout.id}
              background={doc.background}
              mode={mode}
              calibrationPoints={calibrationPoints}
              onMode={setMode}
              onUploaded={(fileId, w, h) => setBackground(initialPlacement(fileId, w, h, bounds()))}
              onBackground={setBackground}
              onGestureEnd={endGesture}
              onResetCalibration={() => setCalibrationPoints([])}
            />
          </Panel>
          <Panel title="Keyboard shortcuts and help">
            <HelpPanel />
          </Panel>
        </aside>
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
