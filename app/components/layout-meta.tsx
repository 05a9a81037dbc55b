import { Field, SelectField, type FieldErrors } from "~/components/ui/form";
import type { LayoutStatus } from "~/lib/roles";
import { SURFACE_LABELS, SURFACES, type Surface } from "~/analysis";
import { carClassLabel } from "~/lib/car-classes";
import { TRACK_WIDTH_MAX_M, TRACK_WIDTH_MIN_M } from "~/lib/schemas/layouts";
import { CarClassPicker } from "./car-class-picker";

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
  /** Car class ids the layout is analysed for. */
  carClasses: readonly string[];
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
    ["Car classes", props.carClasses.map(carClassLabel).join(", ")],
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

/** The name, surface, track width and car class fields, shared by the new-layout form and the layout page. */
export function LayoutMetaFields({
  errors,
  values,
}: {
  errors?: FieldErrors;
  /** What the fields show: the layout's values, or what was sent with an error. */
  values?: { [field: string]: unknown };
}) {
  const text = (v: unknown) => (typeof v === "string" || typeof v === "number" ? String(v) : undefined);
  const classes = values?.carClasses;
  return (
    <>
      <Field
        label="Name"
        name="name"
        required
        maxLength={100}
        defaultValue={text(values?.name)}
        errors={errors?.name}
      />
      <SelectField
        label="Surface"
        name="surface"
        defaultValue={text(values?.surface) ?? "dirt"}
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
        defaultValue={text(values?.trackWidth) ?? 3}
        errors={errors?.trackWidth}
        hint={`Between the track edges, ${TRACK_WIDTH_MIN_M} to ${TRACK_WIDTH_MAX_M} m.`}
      />
      <CarClassPicker
        checked={Array.isArray(classes) ? classes.map(String) : typeof classes === "string" ? [classes] : []}
        errors={errors?.carClasses}
      />
    </>
  );
}
