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
  /**
   * Where uploaded files live: "s3" (any S3-compatible store; the default when S3_BUCKET is set)
   * or "local" (DATA_DIR/files, one machine only).
   */
  get fileStore(): "s3" | "local" {
    const raw = process.env.FILE_STORE ?? (process.env.S3_BUCKET ? "s3" : "local");
    if (raw !== "s3" && raw !== "local") throw new Error(`FILE_STORE must be "s3" or "local" (got "${raw}")`);
    return raw;
  },
  /** The S3 store: bucket, endpoint (empty for AWS itself), region and credentials. */
  get s3() {
    return {
      bucket: process.env.S3_BUCKET ?? "",
      endpoint: process.env.S3_ENDPOINT || undefined,
      region: process.env.S3_REGION ?? "us-east-1",
      accessKeyId: process.env.S3_ACCESS_KEY_ID ?? "",
      secretAccessKey: process.env.S3_SECRET_ACCESS_KEY ?? "",
    };
  },
  get appUrl() {
    return process.env.APP_URL ?? `http://localhost:${process.env.PORT ?? 3000}`;
  },
};
