import { type RouteConfig, index, layout, prefix, route } from "@react-router/dev/routes";

export default [
  index("routes/home.tsx"),
  route("sign-up", "routes/sign-up.tsx"),
  route("sign-in", "routes/sign-in.tsx"),
  route("sign-out", "routes/sign-out.tsx"),
  route("forgot-password", "routes/forgot-password.tsx"),
  route("reset-password/:token", "routes/reset-password.tsx"),
  route("invitations/:token", "routes/invitation.tsx"),
  route("outbox", "routes/outbox.tsx"),

  // JSON API (401/403/404 as JSON) and file downloads: resource routes that check the session themselves.
  route("api/health", "routes/api-health.ts"),
  route("api/layouts/:layoutId", "routes/api-layout.ts"),
  route("api/layouts/:layoutId/analysis", "routes/api-layout-analysis.ts"),
  route("api/analysis", "routes/api-analysis.ts"),
  route("api/layouts/:layoutId/marshal-plan", "routes/api-marshal-plan.ts"),
  route("layouts/:layoutId/export", "routes/layout-export.ts"),
  route("layouts/:layoutId/build/marking.pdf", "routes/build-pack-marking-pdf.ts"),
  route("layouts/:layoutId/build/marking.csv", "routes/build-pack-marking-csv.ts"),
  route("layouts/:layoutId/build/earthworks.pdf", "routes/build-pack-earthworks-pdf.ts"),
  route("layouts/:layoutId/risk.pdf", "routes/risk-sheet-pdf.ts"),
  route("profiles/:profileId/export", "routes/profile-export.ts"),

  // A published version shared by link: signed out, read-only, not indexed, rate limited.
  route("shared/:token", "routes/shared-layout.tsx"),
  route("shared/:token/jumps/:sectionId", "routes/shared-jump.tsx"),

  // Signed-in areas: the layout route's loader requires a user; each child checks its club role.
  layout("routes/signed-in-frame.tsx", [
    route("clubs", "routes/clubs.tsx"),
    ...prefix("clubs/:clubId", [
      layout("routes/club-frame.tsx", [
        index("routes/club-home.tsx"),
        route("members", "routes/club-members.tsx"),
        route("layouts/new", "routes/layout-new.tsx"),
        route("layouts/import", "routes/layout-import.tsx"),
        route("settings", "routes/club-settings.tsx"),
      ]),
    ]),
    route("layouts/:layoutId", "routes/layout-page.tsx"),
    route("layouts/:layoutId/settings", "routes/layout-settings.tsx"),
    route("layouts/:layoutId/jumps/:sectionId", "routes/jump-page.tsx"),
    route("layouts/:layoutId/edit", "routes/layout-editor.tsx"),
    route("layouts/:layoutId/plan", "routes/layout-drawing.tsx"),
    route("layouts/:layoutId/driver-sheet", "routes/driver-sheet.tsx"),
    route("layouts/:layoutId/photo", "routes/layout-photo.tsx"),
    route("layouts/:layoutId/build", "routes/build-pack.tsx"),
    route("layouts/:layoutId/risk", "routes/risk-sheet.tsx"),
    route("layouts/:layoutId/publishing", "routes/layout-publishing.tsx"),
    route("layouts/:layoutId/compare", "routes/layout-compare.tsx"),
    route("layouts/:layoutId/calibrate", "routes/layout-calibrate.tsx"),
    route("profiles", "routes/profiles.tsx"),
    route("profiles/new", "routes/profile-new.tsx"),
    route("profiles/:profileId", "routes/profile-edit.tsx"),
    route("files/:fileId", "routes/file.tsx"),
  ]),
] satisfies RouteConfig;
