/** A reader page's alert: parameters not understood, or an analysis that could not be made. */
export function AnalysisAlert({ text }: { text: string }) {
  if (!text) return null;
  return (
    <p role="alert" className="rounded-md bg-danger-100 px-3 py-2 text-sm text-danger-700">
      {text}
    </p>
  );
}
