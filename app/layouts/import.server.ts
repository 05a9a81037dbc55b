/**
 * Reading a layout file a director imports: an uploaded .json file (form field "file") or JSON
 * pasted into the form (field "json"), at most 1 MB. The file is checked against the layout
 * document schema; every problem is reported with the field it concerns, and nothing is created
 * unless the whole file is valid.
 */
import {
  MaxFileSizeExceededError,
  MaxTotalSizeExceededError,
  parseFormData,
  type FileUpload,
} from "@remix-run/form-data-parser";
import { ONE_MEGABYTE, readLimitedText } from "~/lib/json-body.server";
import { parseLayoutDocument, type LayoutDocument, type LayoutIssue } from "~/analysis";
import { analysisInputIssues, backgroundIssues, documentBudgetIssues } from "./document-checks.server";

/** Largest layout file accepted, bytes. */
export const MAX_LAYOUT_FILE_BYTES = ONE_MEGABYTE;

export type ImportField = "file" | "json";

export type ImportReading =
  | { ok: true; document: LayoutDocument; source: ImportField; notes: string[] }
  | {
      ok: false;
      status: 400 | 413 | 422;
      field: ImportField;
      message: string;
      issues: LayoutIssue[];
      /** Pasted text sent back, so the form shows it again to be corrected. */
      pasted?: string;
    };

const TOO_LARGE = `The file is too large: a layout file is at most ${MAX_LAYOUT_FILE_BYTES / ONE_MEGABYTE} MB.`;

function refuse(
  status: 400 | 413 | 422,
  field: ImportField,
  message: string,
  issues: LayoutIssue[] = [],
  pasted?: string,
): ImportReading {
  return { ok: false, status, field, message, issues, ...(pasted === undefined ? {} : { pasted }) };
}

/** Reads the uploaded or pasted text from a multipart or urlencoded form. */
async function readText(request: Request): Promise<{ field: ImportField; text: string } | ImportReading> {
  const type = request.headers.get("Content-Type") ?? "";
  const declared = Number(request.headers.get("Content-Length") ?? "");
  // A form adds a little around the file; anything far beyond the limit is refused unread.
  if (Number.isFinite(declared) && declared > MAX_LAYOUT_FILE_BYTES + 64 * 1024) {
    return refuse(413, type.startsWith("multipart/") ? "file" : "json", TOO_LARGE);
  }
  if (type.startsWith("multipart/form-data")) {
    let upload: string | undefined;
    let form: FormData;
    try {
      form = await parseFormData(
        request,
        { maxFileSize: MAX_LAYOUT_FILE_BYTES, maxTotalSize: MAX_LAYOUT_FILE_BYTES + 64 * 1024, maxFiles: 1 },
        async (file: FileUpload) => {
          if (file.fieldName === "file" && file.size > 0) upload = await file.text();
          return null;
        },
      );
    } catch (err) {
      if (err instanceof MaxFileSizeExceededError || err instanceof MaxTotalSizeExceededError)
        return refuse(413, "file", TOO_LARGE);
      return refuse(400, "file", "The upload could not be read. Choose the file again.");
    }
    if (upload !== undefined) return { field: "file", text: upload };
    const pasted = form.get("json");
    if (typeof pasted === "string" && pasted.trim() !== "") return { field: "json", text: pasted };
    return refuse(400, "file", "Choose a layout file (.json) or paste its text.");
  }
  if (type.startsWith("application/x-www-form-urlencoded")) {
    let text: string;
    try {
      text = await readLimitedText(request, MAX_LAYOUT_FILE_BYTES + 64 * 1024);
    } catch (err) {
      if (err instanceof Response && err.status === 413) return refuse(413, "json", TOO_LARGE);
      throw err;
    }
    const pasted = new URLSearchParams(text).get("json") ?? "";
    if (pasted.trim() === "") return refuse(400, "json", "Paste the layout file's text, or choose the file.");
    if (new TextEncoder().encode(pasted).byteLength > MAX_LAYOUT_FILE_BYTES)
      return refuse(413, "json", TOO_LARGE);
    return { field: "json", text: pasted };
  }
  return refuse(400, "file", "Send the layout file from the import form.");
}

/**
 * Reads and checks a layout file from the import form of a club.
 * @returns the document (with notes on anything left out) or the refusal with every issue.
 */
export async function readLayoutImport(request: Request, clubId: string): Promise<ImportReading> {
  const read = await readText(request);
  if ("ok" in read) return read;
  const parsed = parseLayoutDocument(read.text.replace(/^\uFEFF/, ""));
  if (!parsed.ok) {
    const n = parsed.issues.length;
    const message = `The file is not a valid Loftline layout: ${n} problem${n === 1 ? "" : "s"} found. Nothing was imported.`;
    return refuse(400, read.field, message, parsed.issues, read.field === "json" ? read.text : undefined);
  }
  const notes: string[] = [];
  let document = parsed.document;
  // A background photo is a file of one club: from another club (or gone) it is left out.
  if ((await backgroundIssues(document, clubId)).length) {
    const { background: _dropped, ...rest } = document;
    document = rest;
    notes.push("The file's background photo is not one of this club's files, so it was left out.");
  }
  // What the analysis would refuse is refused here too, so an imported layout can be analysed.
  const inputs = analysisInputIssues(document);
  const refusals = [...inputs, ...documentBudgetIssues(document)];
  if (refusals.length) {
    const n = refusals.length;
    const message = `The file is a Loftline layout, but it cannot be analysed: ${n} problem${n === 1 ? "" : "s"} found. Nothing was imported.`;
    const pasted = read.field === "json" ? read.text : undefined;
    return refuse(inputs.length ? 400 : 422, read.field, message, refusals, pasted);
  }
  return { ok: true, document, source: read.field, notes };
}
