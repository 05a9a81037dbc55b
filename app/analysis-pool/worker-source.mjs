// The analysis worker for development and tests: loads worker.ts through tsx (with the project's
// tsconfig paths), so edits to the engine reach the pool without a build. Production runs the
// bundle scripts/build-analysis-worker.ts makes (docs/decisions/0461-analysis-worker-entry.md).
import { tsImport } from "tsx/esm/api";

const worker = await tsImport("./worker.ts", import.meta.url);
export default worker.default;
