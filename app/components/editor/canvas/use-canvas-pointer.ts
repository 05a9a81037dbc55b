/**
 * Pointer gestures on the plan canvas that konva does not handle itself: a click selects what is
 * under it (or places a point in a placing mode), a drag of the background pans (Space+drag pans
 * over anything), and in the move-photo mode a drag moves the site photo as one undo step.
 * Handles and markers are konva draggables and are left to konva.
 */
import type Konva from "konva";
import { useEffect, useRef, type Dispatch, type RefObject, type SetStateAction } from "react";
import { moveBackground } from "~/lib/editor/background";
import type { Point } from "~/lib/editor/drag-maths";
import type { Selection } from "~/lib/editor/editor-state";
import { panBy, screenToWorld, type View } from "~/lib/editor/view";
import type { DrawingCanvasProps } from "../canvas-types";

type Press = {
  x: number;
  y: number;
  lastX: number;
  lastY: number;
  moved: boolean;
  target: Selection | "empty";
  photo: boolean;
};

/** True while the space bar is held outside a field or button (Space+drag pans). */
function useSpaceHeld(): RefObject<boolean> {
  const space = useRef(false);
  useEffect(() => {
    const typing = (t: EventTarget | null) =>
      t instanceof HTMLElement &&
      (t.isContentEditable || ["INPUT", "TEXTAREA", "SELECT", "BUTTON"].includes(t.tagName));
    const down = (e: KeyboardEvent) => {
      if (e.code === "Space" && !typing(e.target)) {
        space.current = true;
        e.preventDefault();
      }
    };
    const up = (e: KeyboardEvent) => {
      if (e.code === "Space") space.current = false;
    };
    window.addEventListener("keydown", down);
    window.addEventListener("keyup", up);
    return () => {
      window.removeEventListener("keydown", down);
      window.removeEventListener("keyup", up);
    };
  }, []);
  return space;
}

/** What is under a screen point: a section, a jump marker, or nothing; null for a draggable. */
function hitAt(stage: Konva.Stage | null, p: Point): Selection | "empty" | null {
  const node = stage?.getIntersection(p);
  for (let n: Konva.Node | null = node ?? null; n; n = n.getParent()) {
    if (n.draggable()) return null;
    const m = /(?:^| )(section|verdict)-(\d+)/.exec(n.name());
    if (m) return { kind: "section", index: Number(m[2]) };
  }
  return "empty";
}

export function useCanvasPointer(
  props: DrawingCanvasProps,
  wrapper: RefObject<HTMLDivElement | null>,
  view: View | null,
  setView: Dispatch<SetStateAction<View | null>>,
) {
  const { doc, editable, mode } = props;
  const stageRef = useRef<Konva.Stage>(null);
  const press = useRef<Press | null>(null);
  const space = useSpaceHeld();
  const photoGesture = useRef("");

  const local = (e: React.PointerEvent): Point => {
    const rect = wrapper.current!.getBoundingClientRect();
    return { x: e.clientX - rect.left, y: e.clientY - rect.top };
  };

  const onPointerDown = (e: React.PointerEvent) => {
    if (e.button !== 0 || !view) return;
    const p = local(e);
    const target = space.current ? "empty" : hitAt(stageRef.current, p);
    if (target === null) return; // a handle or marker: konva drags it
    wrapper.current?.setPointerCapture(e.pointerId);
    const photo = editable && mode === "move-photo" && !!doc.background && !space.current;
    if (photo) photoGesture.current = `photo-${Date.now()}`;
    press.current = { x: p.x, y: p.y, lastX: p.x, lastY: p.y, moved: false, target, photo };
  };

  const onPointerMove = (e: React.PointerEvent) => {
    const pr = press.current;
    if (!pr || !view) return;
    const p = local(e);
    if (!pr.moved && Math.hypot(p.x - pr.x, p.y - pr.y) < 4) return;
    pr.moved = true;
    const dx = p.x - pr.lastX;
    const dy = p.y - pr.lastY;
    pr.lastX = p.x;
    pr.lastY = p.y;
    if (pr.photo && doc.background) {
      props.onChange(
        { ...doc, background: moveBackground(doc.background, dx / view.scale, -dy / view.scale) },
        photoGesture.current,
        { kind: "photo" },
      );
    } else {
      setView((v) => (v ? panBy(v, dx, dy) : v));
    }
  };

  const onPointerUp = (e: React.PointerEvent) => {
    const pr = press.current;
    press.current = null;
    if (!pr || !view) return;
    if (pr.moved) {
      if (pr.photo) props.onGestureEnd();
      return;
    }
    if (mode !== "select" && mode !== "move-photo" && editable) {
      props.onPlanClick(screenToWorld(view, local(e)));
      return;
    }
    props.onSelect(pr.target === "empty" ? null : pr.target);
  };

  const onPointerCancel = () => (press.current = null);

  return { stageRef, handlers: { onPointerDown, onPointerMove, onPointerUp, onPointerCancel } };
}
