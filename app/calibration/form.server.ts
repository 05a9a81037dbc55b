/**
 * Reading the calibration form: a multipart upload of one lap file (field "file") and, for a
 * second layout, another (field "file2"), each at most MAX_LAP_FILE_BYTES, with the chosen version,
 * car, columns and second layout. Too large: 413; unreadable: 400. Nothing is stored here.
 */
import {
  MaxFileSizeExceededError,
  MaxFilesExceededError,
  MaxTotalSizeExceededError,
  parseFormData,
  type FileUpload,
} from "@remix-run/form-data-parser";
import { MAX_LAP_FILE_BYTES } from "./lap-file.server";

/** The most a calibration form's body may be: two lap files and the fields, bytes. */
export const MAX_CALIBRATION_BODY_BYTES = 2 * MAX_LAP_FILE_BYTES + 64 * 1024;

export type CalibrationForm = {
  version: string;
  car: string;
  lapColumn: string;
  timeColumn: string;
  /** "layoutId:version" of a second layout's publication, or "". */
  other: string;
  file: string | null;
  file2: string | null;
};

export type FormRefusal = { status: 400 | 413 | 415; field: string; message: string };

const TOO_LARGE = `A lap file is at most ${MAX_LAP_FILE_BYTES / 1024} KB.`;

/** The form's fields and the text of its files, or the refusal. */
export async function readCalibrationForm(
  request: Request,
): Promise<{ ok: true; form: CalibrationForm } | ({ ok: false } & FormRefusal)> {
  const type = request.headers.get("Content-Type") ?? "";
  if (!type.startsWith("multipart/form-data"))
    return { ok: false, status: 415, field: "file", message: "Send the lap file from the calibration form." };
  const declared = Number(request.headers.get("Content-Length") ?? "");
  if (Number.isFinite(declared) && declared > MAX_CALIBRATION_BODY_BYTES)
    return { ok: false, status: 413, field: "file", message: TOO_LARGE };
  const files: Record<string, string> = {};
  let form: FormData;
  try {
    form = await parseFormData(
      request,
      { maxFileSize: MAX_LAP_FILE_BYTES, maxTotalSize: MAX_CALIBRATION_BODY_BYTES, maxFiles: 2 },
      async (file: FileUpload) => {
        if ((file.fieldName === "file" || file.fieldName === "file2") && file.size > 0)
          files[file.fieldName] = await file.text();
        return null;
      },
    );
  } catch (err) {
    if (err instanceof MaxFileSizeExceededError || err instanceof MaxTotalSizeExceededError)
      return { ok: false, status: 413, field: "file", message: TOO_LARGE };
    if (err instanceof MaxFilesExceededError)
      return { ok: false, status: 400, field: "file", message: "Send at most two lap files." };
    return {
      ok: false,
      status: 400,
      field: "file",
      message: "The upload could not be read. Choose the file again.",
    };
  }
  const text = (name: string) => {
    const v = form.get(name);
    return typeof v === "string" ? v.trim() : "";
  };
  return {
    ok: true,
    form: {
      version: text("version"),
      car: text("car"),
      lapColumn: text("lapColumn"),
      timeColumn: text("timeColumn"),
      other: text("other"),
      file: files.file ?? null,
      file2: files.file2 ?? null,
    },
  };
}
