/**
 * The read-only plan for marshals and drivers (and directors who only want to look): the same
 * canvas without handles or editing panels, with the saved layout's analysis (from the analysis
 * API's cached GET, not by sending the document back), its legend and the jump list.
 */
import { useMemo, useState } from "react";
import { Link } from "react-router";
import { closureError, resolveSections, startPose } from "~/analysis";
import type { Selection } from "~/lib/editor/editor-state";
import { DEFAULT_SNAP } from "~/lib/editor/snap";
import type { LengthUnit } from "~/lib/editor/units";
import type { LayoutDocument } from "~/analysis";
import { AnalysisPanel } from "~/components/editor/analysis-panel";
import { ClosureBar } from "~/components/editor/closure-bar";
import { DrawingTitle, photoUrl } from "~/components/drawing/drawing-title";
import { Panel } from "~/components/editor/panel";
import { describeSection } from "~/components/editor/sections-list";
import { LazyDrawingCanvas } from "~/components/editor/lazy-drawing-canvas";
import { useStoredAnalysis, type Skill } from "~/components/editor/use-analysis";

const noop = () => {};

export interface DrawingViewerProps {
  club: { id: string; name: string };
  layout: { id: string; name: string; status: string };
  document: LayoutDocument;
  canEdit: boolean;
  /** The version shown: the layout's version, the saved version's number read (null: the draft) and its query. */
  shown: { version: number; read: number | null; query: Record<string, string> };
  /** The reader's car (a class id or "profile:<id>") and skill to open with, and the cars offered. */
  choice?: { car: string; skill: Skill; cars: { value: string; label: string; own: boolean }[] };
}

export function DrawingViewer({ club, layout, document: doc, canEdit, choice, shown }: DrawingViewerProps) {
  const sections = useMemo(() => resolveSections(doc), [doc]);
  const closure = useMemo(() => closureError(sections, startPose(doc)), [sections, doc]);
  const [selection, setSelection] = useState<Selection>(null);
  const [units, setUnits] = useState<LengthUnit>("m");
  const [classId, setClassId] = useState<string | undefined>(choice?.car ?? doc.carClasses[0]);
  const [skill, setSkill] = useState<Skill>(choice?.skill ?? "club");
  const [fitRequest, setFitRequest] = useState(0);
  const analysis = useStoredAnalysis(layout.id, shown, classId, skill);
  const selected = selection?.kind === "section" ? selection.index : null;
  return (
    <div className="space-y-3">
      <header className="flex flex-wrap items-end gap-x-4 gap-y-2">
        <DrawingTitle club={club} layoutId={layout.id} heading={`Plan of ${doc.name}`} />
        <div className="ml-auto flex items-center gap-3 text-sm">
          <label className="inline-flex items-center gap-1.5">
            Plan in
            <select
              className="rounded-md border border-ink-300 bg-white px-1.5 py-1 text-sm"
              value={units}
              onChange={(e) => setUnits(e.target.value as LengthUnit)}
            >
              <option value="m">metres</option>
              <option value="ft">feet</option>
            </select>
          </label>
          <button
            type="button"
            className="rounded-md border border-ink-300 bg-white px-2.5 py-1.5 font-medium hover:bg-sand-100"
            onClick={() => setFitRequest((n) => n + 1)}
          >
            Fit
          </button>
          {canEdit ? (
            <Link
              to={`/layouts/${layout.id}/edit`}
              className="rounded-md bg-pine-700 px-3 py-1.5 font-medium text-white hover:bg-pine-800"
            >
              Edit the layout
            </Link>
          ) : null}
        </div>
      </header>
      <ClosureBar closure={closure} units={units} editable={false} message={null} />
      <div className="flex flex-col gap-3 lg:flex-row">
        <div
          className="relative h-[62vh] min-h-[360px] overflow-hidden rounded-md border border-ink-300 lg:flex-1"
          role="img"
          aria-label={`Plan of ${doc.name}: ${doc.sections.length} sections; the jumps and their verdicts are listed beside it`}
        >
          <LazyDrawingCanvas
            doc={doc}
            sections={sections}
            selection={selection}
            editable={false}
            mode="select"
            snap={DEFAULT_SNAP}
            units={units}
            overlay={analysis.overlay}
            overlayStale={false}
            photoUrl={photoUrl(doc.background)}
            fitRequest={fitRequest}
            calibrationPoints={[]}
            onSelect={setSelection}
            onChange={noop}
            onGestureEnd={noop}
            onPlanClick={noop}
          />
        </div>
        <aside className="space-y-2 lg:w-[22rem]" aria-label="About this plan">
          <Panel title="Jumps and verdicts" open>
            <AnalysisPanel
              overlay={analysis.overlay}
              status={analysis.status}
              stale={false}
              sections={doc.sections}
              classIds={doc.carClasses}
              carOptions={choice?.cars}
              classId={classId}
              skill={skill}
              selected={selected}
              onClass={setClassId}
              onSkill={setSkill}
              onSelect={(index) => setSelection({ kind: "section", index })}
            />
          </Panel>
          <Panel title={`Sections (${doc.sections.length})`} open={selected !== null}>
            <ol className="max-h-64 space-y-0.5 overflow-y-auto text-sm">
              {doc.sections.map((s, i) => (
                <li
                  key={s.id}
                  className={`rounded px-2 py-0.5 tabular-nums ${selected === i ? "bg-clay-100 font-semibold text-clay-700" : ""}`}
                >
                  {i + 1}. {describeSection(s, sections[i])}
                </li>
              ))}
            </ol>
          </Panel>
          {doc.marshalPoints.length ? (
            <Panel title={`Marshal points (${doc.marshalPoints.length})`}>
              <p className="text-sm text-ink-700">
                Numbered on the plan. Stand out of the overshoot zone beyond landings and the outside of fast
                turns, stay low and face the traffic; closed shoes, eye protection and hi-vis.
              </p>
            </Panel>
          ) : null}
        </aside>
      </div>
    </div>
  );
}
