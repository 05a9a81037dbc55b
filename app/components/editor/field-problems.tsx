/**
 * Which editor fields show a refused value right now, so that a save can be refused while any
 * does, naming them (docs/decisions/0511-keys-and-saving.md). Fields report
 * through useReportProblem; the editor reads the list through useFieldProblemList.
 */
import { createContext, useCallback, useContext, useEffect, useMemo, useState, type ReactNode } from "react";

export interface FieldProblem {
  /** The field's label and where it is, e.g. "Length (section 3)". */
  label: string;
  /** The input's element id, to move the focus there. */
  inputId: string;
}

interface Registry {
  report(key: string, problem: FieldProblem | null): void;
}

const RegistryContext = createContext<Registry | null>(null);

/** The editor's list of fields in error and the provider that collects it. */
export function useFieldProblemList() {
  const [problems, setProblems] = useState<ReadonlyMap<string, FieldProblem>>(new Map());
  const report = useCallback((key: string, problem: FieldProblem | null) => {
    setProblems((old) => {
      if (!problem && !old.has(key)) return old;
      const cur = old.get(key);
      if (problem && cur && cur.label === problem.label && cur.inputId === problem.inputId) return old;
      const next = new Map(old);
      if (problem) next.set(key, problem);
      else next.delete(key);
      return next;
    });
  }, []);
  const registry = useMemo(() => ({ report }), [report]);
  const list = useMemo(() => [...problems.values()], [problems]);
  return { problems: list, registry };
}

/** Fields inside report their problems to this registry. */
export function FieldProblemsScope({ registry, children }: { registry: Registry; children: ReactNode }) {
  return <RegistryContext.Provider value={registry}>{children}</RegistryContext.Provider>;
}

/** Reports this field's problem (or none) while it is on screen. Outside an editor it does nothing. */
export function useReportProblem(key: string, problem: FieldProblem | null) {
  const registry = useContext(RegistryContext);
  const label = problem?.label ?? null;
  const inputId = problem?.inputId ?? null;
  useEffect(() => {
    if (!registry) return;
    registry.report(key, label !== null && inputId !== null ? { label, inputId } : null);
  }, [registry, key, label, inputId]);
  useEffect(() => () => registry?.report(key, null), [registry, key]);
}

/** "Length (section 3) and Track width": the fields named in one phrase. */
export function nameFields(problems: readonly FieldProblem[]): string {
  const names = problems.map((p) => p.label);
  if (names.length <= 1) return names.join("");
  return `${names.slice(0, -1).join(", ")} and ${names[names.length - 1]}`;
}
