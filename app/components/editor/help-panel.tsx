import { SHORTCUTS } from "./use-editor-keys";

/** Keyboard shortcuts and how to calibrate the photo, in a panel the director can open. */
export function HelpPanel() {
  return (
    <div className="space-y-3 text-sm">
      <table className="w-full text-left text-xs">
        <caption className="sr-only">Keyboard shortcuts</caption>
        <thead>
          <tr>
            <th scope="col" className="pb-1 font-semibold">
              Keys
            </th>
            <th scope="col" className="pb-1 font-semibold">
              Does
            </th>
          </tr>
        </thead>
        <tbody>
          {SHORTCUTS.map((s) => (
            <tr key={s.keys} className="border-t border-sand-200 align-top">
              <td className="py-1 pr-2 font-mono whitespace-nowrap">{s.keys}</td>
              <td className="py-1">{s.action}</td>
            </tr>
          ))}
        </tbody>
      </table>
      <p className="text-xs text-ink-700">
        Calibrating the photo: choose <em>Calibrate the scale</em>, click two points on the photo whose real
        distance you know, type that distance in metres and choose <em>Set the scale</em>. The first point
        stays where it is; then move the photo under the track.
      </p>
    </div>
  );
}
