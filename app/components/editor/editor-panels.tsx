import { initialPlacement } from "~/lib/editor/background";
import { resizeJump } from "~/lib/editor/jump-resize";
import { changeSectionKind } from "~/lib/editor/section-ops";
import type { LayoutSection } from "~/analysis";
import { AnalysisPanel } from "./analysis-panel";
import { HelpPanel } from "./help-panel";
import { MarshalPlanPanel } from "./marshal-plan-panel";
import { Panel } from "./panel";
import { PhotoPanel } from "./photo-panel";
import { SectionPanel } from "./section-panel";
import { SectionsList } from "./sections-list";
import { SitePanel } from "./site-panel";
import type { useAnalysis, Skill } from "./use-analysis";
import type { useMarshalOnPlan } from "./use-marshal-plan";
import type { EditorCommands, EditorTools } from "./use-editor-commands";
import type { EditorDocument } from "./use-editor-document";

export interface AnalysisChoice {
  classId: string | undefined;
  skill: Skill;
  setClassId(classId: string): void;
  setSkill(skill: Skill): void;
}

interface Props {
  layoutId: string;
  ed: EditorDocument;
  tools: EditorTools;
  commands: EditorCommands;
  analysis: ReturnType<typeof useAnalysis>;
  /** The marshal plan (asked by the editor, drawn on the plan too) and the zones' tick box. */
  marshal: ReturnType<typeof useMarshalOnPlan>;
  choice: AnalysisChoice;
}

/** The editor's side panels: the selected section, the live analysis, the site, the photo, help. */
export function EditorPanels({ layoutId, ed, tools, commands, analysis, marshal, choice }: Props) {
  const { doc, sections, selected, state, change, select, endGesture } = ed;
  const selectSection = (index: number) => select({ kind: "section", index });
  /** A changed section; a jump's new size is given or taken by the straight chosen to keep the loop closed. */
  const onSection = (index: number, s: LayoutSection, gesture: string): string | null => {
    if (s.kind === "jump") {
      const out = resizeJump(doc, index, s, tools.keepClosedBy);
      if (!out.ok) return out.message;
      change(out.doc, gesture);
      return null;
    }
    change({ ...doc, sections: doc.sections.map((x, i) => (i === index ? s : x)) }, gesture);
    return null;
  };
  return (
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
            snap={tools.snap}
            overlayJump={analysis.overlay?.jumps.find((j) => j.sectionId === doc.sections[selected]?.id)}
            onSection={(s, g) => onSection(selected, s, g)}
            onPreset={(p) => {
              const next = changeSectionKind(doc, selected, "jump", p);
              const kept = resizeJump(doc, selected, next.sections[selected] as never, tools.keepClosedBy);
              change(kept.ok ? kept.doc : next);
            }}
            onGestureEnd={endGesture}
            keepClosedBy={tools.keepClosedBy}
            onKeepClosedBy={tools.setKeepClosedBy}
          />
        ) : (
          <p className="text-sm text-ink-500">Click a section on the plan or in the list to change it.</p>
        )}
        <SectionsList
          sections={doc.sections}
          resolved={sections}
          selected={selected}
          onSelect={selectSection}
        />
      </Panel>
      <Panel title="Live analysis" open>
        <AnalysisPanel
          overlay={analysis.overlay}
          status={analysis.status}
          stale={analysis.overlayDoc !== doc}
          sections={doc.sections}
          classIds={doc.carClasses}
          classId={choice.classId}
          skill={choice.skill}
          selected={selected}
          onClass={choice.setClassId}
          onSkill={choice.setSkill}
          onSelect={selectSection}
        />
      </Panel>
      <Panel
        title="Site: width, stand, marshals, boundary"
        open={
          state.selection !== null && state.selection.kind !== "section" && state.selection.kind !== "photo"
        }
      >
        <SitePanel
          doc={doc}
          selection={state.selection}
          mode={tools.mode}
          bounds={commands.bounds}
          onMode={tools.setMode}
          onChange={change}
          onSelect={select}
          onGestureEnd={endGesture}
        />
      </Panel>
      <Panel title="Marshal points: warnings and suggestions" open={state.selection?.kind === "marshal"}>
        <MarshalPlanPanel
          doc={doc}
          marshal={marshal.state}
          showZones={marshal.showZones}
          onShowZones={marshal.setShowZones}
          onChange={change}
        />
      </Panel>
      <Panel title="Site photo" open={tools.mode === "calibrate" || state.selection?.kind === "photo"}>
        <PhotoPanel
          layoutId={layoutId}
          background={doc.background}
          mode={tools.mode}
          calibrationPoints={tools.calibrationPoints}
          onMode={tools.setMode}
          onUploaded={(fileId, w, h) =>
            commands.setBackground(initialPlacement(fileId, w, h, commands.bounds()))
          }
          onBackground={commands.setBackground}
          onGestureEnd={endGesture}
          onResetCalibration={() => tools.setCalibrationPoints([])}
        />
      </Panel>
      <Panel title="Keyboard shortcuts and help">
        <HelpPanel />
      </Panel>
    </aside>
  );
}
