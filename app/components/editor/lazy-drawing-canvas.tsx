import { lazy, Suspense } from "react";
import type { DrawingCanvasProps } from "./canvas-types";
import { CanvasPlaceholder, ClientOnly } from "./client-only";

const DrawingCanvas = lazy(() => import("./drawing-canvas"));

/**
 * The plan canvas for the editor and the read-only plan: drawn in the browser only, its code (and
 * konva's) loaded on first use; a placeholder stands in on the server and while it loads.
 */
export function LazyDrawingCanvas(props: DrawingCanvasProps) {
  return (
    <ClientOnly fallback={<CanvasPlaceholder />}>
      {() => (
        <Suspense fallback={<CanvasPlaceholder />}>
          <DrawingCanvas {...props} />
        </Suspense>
      )}
    </ClientOnly>
  );
}
