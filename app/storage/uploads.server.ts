import {
  MaxFileSizeExceededError,
  MaxFilesExceededError,
  MaxTotalSizeExceededError,
  parseFormData,
  type FileUpload,
} from "@remix-run/form-data-parser";
import { eq, sql } from "drizzle-orm";
import { getDb } from "~/db/client.server";
import { files } from "~/db/schema";
import { config } from "~/lib/config.server";
import { fileStore } from "./storage.server";
import { StoreUnavailableError, storeUnavailableResponse } from "./store.server";

export const MAX_PHOTO_BYTES = 10 * 1024 * 1024;

export type UploadKind = {
  field: string;
  maxBytes: number;
  types: Record<string, { ext: string; magic?: number[] }>;
};

/** Site photos: PNG or JPEG, checked by their first bytes as well as the declared type. */
export const SITE_PHOTO: UploadKind = {
  field: "photo",
  maxBytes: MAX_PHOTO_BYTES,
  types: {
    "image/png": { ext: "png", magic: [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a] },
    "image/jpeg": { ext: "jpg", magic: [0xff, 0xd8, 0xff] },
  },
};

function fail(status: number, field: string, message: string): Response {
  return Response.json({ error: message, field, errors: { [field]: [message] } }, { status });
}

const MB = 1024 * 1024;
const megabytes = (bytes: number) => `${(bytes / MB).toFixed(bytes < 10 * MB ? 1 : 0)} MB`;

/** Bytes of the club's stored files. */
export async function clubFileBytes(clubId: string): Promise<number> {
  const db = await getDb();
  const [row] = await db
    .select({ bytes: sql<number>`coalesce(sum(${files.size}), 0)` })
    .from(files)
    .where(eq(files.clubId, clubId));
  return Number(row?.bytes ?? 0);
}

function overQuota(field: string, used: number): Response {
  const quota = config.clubFileQuotaBytes;
  return fail(
    413,
    field,
    `The club's files would go over its storage quota of ${megabytes(quota)} (${megabytes(used)} used). Delete layouts you no longer need: photos no saved version uses are removed by the site's clean-up.`,
  );
}

/**
 * Reads one uploaded file from a multipart request, refusing anything too large (413), over the
 * club's storage quota (413), of the wrong type (415) or missing (400), stores it, and records it
 * in the files table.
 * @returns the stored file's id and content type; throws a JSON Response on bad input.
 */
export async function receiveUpload(
  request: Request,
  kind: UploadKind,
  owner: { clubId: string; userId: string },
): Promise<{ fileId: string; contentType: string; size: number; fields: FormData }> {
  const declared = Number(request.headers.get("Content-Length") ?? "0");
  if (declared > kind.maxBytes + 64 * 1024) {
    throw fail(413, kind.field, `The file is too large: at most ${kind.maxBytes / (1024 * 1024)} MB.`);
  }
  const usedBefore = await clubFileBytes(owner.clubId);
  if (usedBefore >= config.clubFileQuotaBytes) throw overQuota(kind.field, usedBefore);
  if (!(request.headers.get("Content-Type") ?? "").startsWith("multipart/form-data")) {
    throw fail(400, kind.field, "Send the file as a multipart form upload.");
  }
  let upload: { bytes: Uint8Array; type: string; name: string } | undefined;
  let fields: FormData;
  try {
    fields = await parseFormData(
      request,
      { maxFileSize: kind.maxBytes, maxFiles: 1 },
      async (file: FileUpload) => {
        if (file.fieldName !== kind.field) return null;
        upload = { bytes: new Uint8Array(await file.arrayBuffer()), type: file.type, name: file.name };
        return null;
      },
    );
  } catch (err) {
    if (err instanceof MaxFileSizeExceededError || err instanceof MaxTotalSizeExceededError) {
      throw fail(413, kind.field, `The file is too large: at most ${kind.maxBytes / (1024 * 1024)} MB.`);
    }
    if (err instanceof MaxFilesExceededError) throw fail(400, kind.field, "Send one file at a time.");
    throw fail(400, kind.field, "The upload could not be read.");
  }
  if (!upload || upload.bytes.length === 0) throw fail(400, kind.field, "Choose a file to upload.");
  const accepted = Object.keys(kind.types)
    .map((t) => t.replace("image/", "").toUpperCase())
    .join(" or ");
  const type = kind.types[upload.type];
  if (!type || (type.magic && !type.magic.every((b, i) => upload!.bytes[i] === b))) {
    throw fail(415, kind.field, `Only ${accepted} files are accepted.`);
  }
  const id = crypto.randomUUID();
  const storageKey = `${owner.clubId}/${id}.${type.ext}`;
  try {
    await fileStore().put(storageKey, upload.bytes);
  } catch (err) {
    if (err instanceof StoreUnavailableError) {
      console.error(`[loftline] upload refused: ${err.message}`);
      throw storeUnavailableResponse(kind.field);
    }
    throw err;
  }
  const db = await getDb();
  const size = upload.bytes.length;
  let inserted: number;
  try {
    // One statement sums the club's files and inserts only within the quota, so parallel uploads
    // cannot all slip under it (docs/decisions/0304-single-statement-writes.md).
    const result = await db.run(sql`
      INSERT INTO files (id, club_id, storage_key, content_type, size, original_name, created_by, created_at)
      SELECT ${id}, ${owner.clubId}, ${storageKey}, ${upload.type}, ${size}, ${upload.name.slice(0, 200)},
             ${owner.userId}, ${Date.now()}
      WHERE (SELECT coalesce(sum(size), 0) FROM files WHERE club_id = ${owner.clubId}) + ${size}
            <= ${config.clubFileQuotaBytes}`);
    inserted = result.rowsAffected;
  } catch (err) {
    await fileStore().delete(storageKey);
    throw err;
  }
  if (inserted !== 1) {
    await fileStore().delete(storageKey);
    throw overQuota(kind.field, await clubFileBytes(owner.clubId));
  }
  return { fileId: id, contentType: upload.type, size, fields };
}

/** A stored file's record (club, key, type, size), or null. */
export async function findStoredFile(fileId: string) {
  const db = await getDb();
  const [row] = await db
    .select({
      clubId: files.clubId,
      storageKey: files.storageKey,
      contentType: files.contentType,
      size: files.size,
    })
    .from(files)
    .where(eq(files.id, fileId));
  return row ?? null;
}

/**
 * The file's bytes as a stream (never held whole), or null when the store has lost it. A store
 * that cannot be reached throws a 503 JSON Response.
 */
export async function openStoredFile(storageKey: string) {
  try {
    return await fileStore().open(storageKey);
  } catch (err) {
    if (err instanceof StoreUnavailableError) {
      console.error(`[loftline] file read refused: ${err.message}`);
      throw storeUnavailableResponse();
    }
    throw err;
  }
}

/** A stored file's bytes and metadata, or null (small files and tests). */
export async function readStoredFile(fileId: string) {
  const row = await findStoredFile(fileId);
  if (!row) return null;
  const bytes = await fileStore().get(row.storageKey);
  return bytes ? { ...row, bytes } : null;
}
