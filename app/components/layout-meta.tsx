import { Field, SelectField, type FieldErrors } from "~/components/ui/form";
import type { LayoutStatus } from "~/lib/roles";
import { SURFACE_LABELS, SURFACES, type Surface } from "~/analysis";
import { TRACK_WIDTH_MAX_M, TRACK_WIDTH_MIN_M } from "~/lib/schemas/layouts";

const STATUS_STYLES: Record<LayoutStatus, string> = {
  draft: "border-clay-500 bg-clay-100 text-clay-700",
  published: "border-pine-600 bg-pine-50 text-pine-800",
  archived: "border-ink-300 bg-sand-100 text-ink-500",
};

export const STATUS_LABELS: Record<LayoutStatus, string> = {
  draft: "Draft",
  published: "Published",
  archived: "Archived",
};

/** A layout's status as a word in a coloured outline (the word carries the meaning, not the colour). */
export function StatusBadge({ status }: { status: LayoutStatus }) {
  return (
    <span
      className={`inline-block rounded-full border px-2 py-0.5 text-xs font-medium ${STATUS_STYLES[status]}`}
    >
      {STATUS_LABELS[status]}
    </span>
  );
}

export function surfaceLabel(surface: string): string {
  return SURFACE_LABELS[surface as Surface] ?? surface;
}

export type LayoutMetaProps = {
  name: string;
  surface: string;
  /** Track width between the edges, m. */
  trackWidth: number;
  status: LayoutStatus;
  version: number;
  createdAt: Date | string;
  updatedAt: Date | string;
  createdByName: string | null;
  clubName: string;
};

const dateFormat = new Intl.DateTimeFormat("en-GB", {
  day: "numeric",
  month: "short",
  year: "numeric",
  timeZone: "UTC",
});

function day(value: Date | string): string {
  return dateFormat.format(new Date(value));
}

/** The layout's facts, as a definition list that reads well on a phone and on paper. */
export function LayoutMeta(props: LayoutMetaProps) {
  const rows: [string, React.ReactNode][] = [
    ["Club", props.clubName],
    ["Status", <StatusBadge key="s" status={props.status} />],
    ["Surface", surfaceLabel(props.surface)],
    ["Track width", `${props.trackWidth} m`],
    ["Version", String(props.version)],
    [
      "Created",
      props.createdByName ? `${day(props.createdAt)} by ${props.createdByName}` : day(props.createdAt),
    ],
    ["Last changed", day(props.updatedAt)],
  ];
  return (
    <dl className="grid grid-cols-[auto_1fr] gap-x-6 gap-y-2 text-sm">
      {rows.map(([term, value]) => (
        <div key={term} className="contents">
          <dt className="text-ink-500">{term}</dt>
          <dd className="text-ink-900">{value}</dd>
        </div>
      ))}
    </dl>
  );
}

/** The name, surface and track width fields, shared by the new-layout form and the layout page. */
export function LayoutMetaFields({
  errors,
  values,
}: {
  errors?: FieldErrors;
  values?: { name?: string; surface?: string; trackWidth?: number | string };
}) {
  return (
    <>
      <Field
        label="Name"
        name="name"
        required
        maxLength={100}
        defaultValue={values?.name}
        errors={errors?.name}
      />
      <SelectField
        label="Surface"
        name="surface"
        defaultValue={values?.surface ?? "dirt"}
        errors={errors?.surface}
      >
        {SURFACES.map((s) => (
          <option key={s} value={s}>
            {SURFACE_LABELS[s]}
          </option>
        ))}
      </SelectField>
      <Field
        label="Track width (m)"
        name="trackWidth"
        inputMode="decimal"
        required
        defaultValue={values?.trackWidth ?? 3}
        errors={errors?.trackWidth}
        hint={`Between the track edges, ${TRACK_WIDTH_MIN_M} to ${TRACK_WIDTH_MAX_M} m.`}
      />
    </>
  );
}
