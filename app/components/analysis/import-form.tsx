import { Form, useNavigation } from "react-router";
import { Button } from "~/components/ui/button";
import { FieldError } from "~/components/ui/form";
import { ImportIssues } from "./import-issues";

/** Largest layout file, MB (the server checks it: app/layouts/import.server.ts). */
const MAX_MB = 1;

export type ImportResult = {
  field: "file" | "json";
  message: string;
  issues: { path: string; message: string }[];
  /** The pasted text, shown again to be corrected. */
  pasted?: string;
};

/** The import form; also shown on the club's layout list for directors. */
export function ImportForm({ clubId, result }: { clubId: string; result?: ImportResult }) {
  const busy = useNavigation().state === "submitting";
  const fileErrors = result?.field === "file" ? [result.message] : undefined;
  const jsonErrors = result?.field === "json" ? [result.message] : undefined;
  return (
    <Form
      method="post"
      action={`/clubs/${clubId}/layouts/import`}
      encType="multipart/form-data"
      className="mt-4 space-y-4"
    >
      <div className="space-y-1">
        <label htmlFor="import-file" className="block text-sm font-medium text-ink-700">
          Layout file (.json, at most {MAX_MB} MB)
        </label>
        <input
          id="import-file"
          name="file"
          type="file"
          accept=".json,application/json"
          className="block w-full text-sm file:mr-3 file:rounded-md file:border file:border-ink-300 file:bg-white file:px-3 file:py-1.5"
          aria-invalid={fileErrors ? true : undefined}
          aria-describedby={fileErrors ? "import-file-error" : undefined}
        />
        <FieldError id="import-file-error" errors={fileErrors} />
      </div>
      <details className="text-sm" open={Boolean(jsonErrors)}>
        <summary className="cursor-pointer text-pine-700">Or paste the file's text</summary>
        <div className="mt-2 space-y-1">
          <label htmlFor="import-json" className="block text-sm font-medium text-ink-700">
            Layout file text (JSON)
          </label>
          <textarea
            id="import-json"
            name="json"
            rows={6}
            defaultValue={result?.pasted}
            spellCheck={false}
            className="block w-full rounded-md border border-ink-300 bg-white px-3 py-2 font-mono text-xs"
            aria-invalid={jsonErrors ? true : undefined}
            aria-describedby={jsonErrors ? "import-json-error" : undefined}
          />
          <FieldError id="import-json-error" errors={jsonErrors} />
        </div>
      </details>
      {result?.issues.length ? <ImportIssues issues={result.issues} /> : null}
      <Button type="submit" variant="secondary" disabled={busy}>
        Import as a new draft
      </Button>
    </Form>
  );
}
