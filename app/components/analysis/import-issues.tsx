/** The problems found in a refused layout file, each naming its field ("sections[3].radius"). */
export function ImportIssues({
  issues,
  limit = 40,
}: {
  issues: { path: string; message: string }[];
  limit?: number;
}) {
  const shown = issues.slice(0, limit);
  return (
    <div role="alert" className="rounded-md border border-danger-100 bg-danger-100/50 p-3 text-sm">
      <p className="font-medium text-danger-700">Problems in the file (nothing was imported):</p>
      <ul className="mt-2 list-disc space-y-1 pl-5">
        {shown.map((issue, i) => (
          <li key={`${issue.path}-${i}`}>
            <code className="rounded bg-white px-1 text-xs">{issue.path}</code> {issue.message}
          </li>
        ))}
      </ul>
      {issues.length > shown.length ? (
        <p className="mt-2 text-ink-700">…and {issues.length - shown.length} more.</p>
      ) : null}
    </div>
  );
}
