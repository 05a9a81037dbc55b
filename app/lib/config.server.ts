import path from "node:path";

/** Runtime configuration from the environment, with the embedded defaults of a single machine. */
export const config = {
  get dataDir() {
    return path.resolve(process.env.DATA_DIR ?? "./data");
  },
  get databaseUrl() {
    return process.env.DATABASE_URL ?? `file:${path.join(this.dataDir, "loftline.db")}`;
  },
  get smtpUrl() {
    return process.env.SMTP_URL ?? "smtp://127.0.0.1:2525";
  },
  get mailFrom() {
    return process.env.MAIL_FROM ?? "Loftline <no-reply@loftline.local>";
  },
  get isProduction() {
    return process.env.NODE_ENV === "production";
  },
  /** The demo and development show the outbox page and the demo passwords. */
  get showDevTools() {
    return process.env.NODE_ENV !== "production" || process.env.LOFTLINE_DEMO === "1";
  },
  /** Bytes of uploaded files one club may keep (LOFTLINE_CLUB_FILE_QUOTA_MB, default 200 MB). */
  get clubFileQuotaBytes() {
    const raw = process.env.LOFTLINE_CLUB_FILE_QUOTA_MB;
    const mb = raw ? Number(raw) : 200;
    if (!(mb > 0)) throw new Error(`LOFTLINE_CLUB_FILE_QUOTA_MB must be a number above 0 (got "${raw}")`);
    return Math.round(mb * 1024 * 1024);
  },
  get appUrl() {
    return process.env.APP_URL ?? `http://localhost:${process.env.PORT ?? 3000}`;
  },
};
