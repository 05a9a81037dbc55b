import { execFileSync } from "node:child_process";

/**
 * The text of a PDF as Debian's poppler-utils pdftotext extracts it (layout kept), which also
 * proves the file is a PDF a standard reader opens. scripts/test.sh installs poppler-utils when
 * /usr/bin/pdftotext is missing.
 */
export function pdfText(bytes: Uint8Array): string {
  return execFileSync("pdftotext", ["-layout", "-enc", "UTF-8", "-", "-"], {
    input: bytes,
    maxBuffer: 32 * 1024 * 1024,
  }).toString("utf8");
}
