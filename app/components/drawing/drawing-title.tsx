import { Fragment } from "react";
import { Link } from "react-router";

/** The editor's and the read-only plan's title: the way back (club, layout page, more) and the heading. */
export function DrawingTitle({
  club,
  layoutId,
  heading,
  links = [],
}: {
  club: { id: string; name: string };
  layoutId: string;
  heading: string;
  links?: { to: string; label: string }[];
}) {
  const trail = [
    { to: `/clubs/${club.id}`, label: club.name },
    { to: `/layouts/${layoutId}`, label: "Layout page" },
    ...links,
  ];
  return (
    <div className="min-w-0">
      <p className="text-xs text-ink-500">
        {trail.map((t, i) => (
          <Fragment key={t.to}>
            {i > 0 ? " · " : null}
            <Link to={t.to} className="underline">
              {t.label}
            </Link>
          </Fragment>
        ))}
      </p>
      <h1 className="truncate text-xl font-semibold">{heading}</h1>
    </div>
  );
}

/** Where a layout's site photo is served from. */
export function photoUrl(background: { fileId: string } | undefined): string | null {
  return background ? `/files/${background.fileId}` : null;
}
