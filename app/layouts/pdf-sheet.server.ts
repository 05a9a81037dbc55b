/**
 * A small writer of printable A4 sheets on pdf-lib (drawn on the server, no browser): headings,
 * wrapped paragraphs, tables that run over pages with their heading row repeated, boxes to draw
 * in, and a footer with the page number on every page. The standard Helvetica keeps the text
 * extractable and the file small; characters it cannot encode become their plain letter or "?".
 *
 * Text goes into one raw content stream per page (a line of PDF operators a piece of text)
 * rather than through `page.drawText`, which costs about half a millisecond a call: a sheet of a
 * few thousand table cells is then made in tens of milliseconds instead of seconds.
 */
import { deflateSync } from "node:zlib";
import {
  PDFDocument,
  PDFName,
  PDFRawStream,
  StandardFonts,
  rgb,
  type Color,
  type PDFFont,
  type PDFPage,
  type RGB,
} from "pdf-lib";

export type Column = { title: string; width: number; align?: "left" | "right" };

const A4 = { portrait: [595.28, 841.89], landscape: [841.89, 595.28] } as const;
const MARGIN = 36;
const INK = rgb(0.08, 0.11, 0.14);
const GREY = rgb(0.35, 0.4, 0.46);
const RULE = rgb(0.8, 0.78, 0.72);
const STRIPE = rgb(0.96, 0.95, 0.92);

export type PdfSheet = Awaited<ReturnType<typeof createPdfSheet>>;

/**
 * @param opts.title the document title (metadata and the first heading)
 * @param opts.footer text at the foot of every page (the page number is added)
 */
export async function createPdfSheet(opts: {
  title: string;
  footer: string;
  orientation?: "portrait" | "landscape";
}) {
  const pdf = await PDFDocument.create();
  pdf.setTitle(opts.title);
  pdf.setCreator("Loftline");
  pdf.setProducer("Loftline (pdf-lib)");
  const font = await pdf.embedFont(StandardFonts.Helvetica);
  const bold = await pdf.embedFont(StandardFonts.HelveticaBold);
  const encodable = new Set(font.getCharacterSet());
  const [pageW, pageH] = A4[opts.orientation ?? "portrait"];
  const width = pageW - 2 * MARGIN;
  let page: PDFPage = pdf.addPage([pageW, pageH]);
  let y = pageH - MARGIN;
  let ops = "";
  const hex = new Map<string, string>();
  const encode = (f: PDFFont, text: string) => {
    let out = "";
    for (const ch of text) {
      let h = hex.get(ch);
      if (h === undefined) {
        h = f.encodeText(ch).toString().slice(1, -1);
        hex.set(ch, h);
      }
      out += h;
    }
    return out;
  };
  const keys = () => ({
    regular: page.node.newFontDictionary(font.name, font.ref).toString(),
    heavy: page.node.newFontDictionary(bold.name, bold.ref).toString(),
  });
  let fontKeys = keys();
  /** Writes text at (x, y) points, baseline left. */
  const put = (text: string, x: number, yy: number, size: number, f: PDFFont = font, color: Color = INK) => {
    const c = color as RGB;
    const key = f === bold ? fontKeys.heavy : fontKeys.regular;
    ops += `${c.red} ${c.green} ${c.blue} rg ${key} ${size} Tf 1 0 0 1 ${x.toFixed(2)} ${yy.toFixed(2)} Tm <${encode(f, text)}> Tj\n`;
  };
  /** Adds the page's text as its last content stream (drawn over the rules and stripes). */
  const flush = () => {
    if (!ops) return;
    // Node's own zlib: pdf-lib's pure-JS deflate is the slow part of a long sheet.
    const bytes = deflateSync(Buffer.from(`q BT\n${ops}ET Q\n`, "latin1"));
    const dict = pdf.context.obj({ Filter: PDFName.of("FlateDecode"), Length: bytes.length });
    page.node.addContentStream(pdf.context.register(PDFRawStream.of(dict, bytes)));
    ops = "";
  };

  /** Text the standard font can show: accents dropped where needed, the rest as "?". */
  const safe = (text: string) =>
    Array.from(text, (ch) => {
      if (encodable.has(ch.codePointAt(0)!)) return ch;
      const plain = ch.normalize("NFKD").replace(/[\u0300-\u036f]/g, "");
      return plain && Array.from(plain).every((c) => encodable.has(c.codePointAt(0)!)) ? plain : "?";
    }).join("");

  const newPage = () => {
    flush();
    page = pdf.addPage([pageW, pageH]);
    fontKeys = keys();
    y = pageH - MARGIN;
  };
  /** Starts a new page unless `height` points still fit above the footer. */
  const ensure = (height: number) => {
    if (y - height < MARGIN + 18) newPage();
  };
  // Glyph widths per 1000 units of size, remembered per font and character (the text is set
  // without kerning, so the sum of the glyphs is its width).
  const widths = new Map<string, number>();
  const textWidth = (text: string, f: PDFFont, size: number) => {
    let w = 0;
    for (const ch of text) {
      const key = (f === bold ? "b" : "r") + ch;
      let g = widths.get(key);
      if (g === undefined) {
        g = f.widthOfTextAtSize(ch, 1000);
        widths.set(key, g);
      }
      w += g;
    }
    return (w * size) / 1000;
  };
  const fit = (text: string, f: PDFFont, size: number, max: number) => {
    let t = safe(text);
    if (textWidth(t, f, size) <= max) return t;
    while (t.length > 1 && textWidth(`${t}…`, f, size) > max) t = t.slice(0, -1);
    return `${t}…`;
  };
  const wrap = (text: string, f: PDFFont, size: number, max: number) => {
    const lines: string[] = [];
    let line = "";
    for (const word of safe(text).split(/\s+/)) {
      const next = line ? `${line} ${word}` : word;
      if (line && textWidth(next, f, size) > max) {
        lines.push(line);
        line = word;
      } else line = next;
    }
    if (line) lines.push(line);
    return lines;
  };

  const sheet = {
    font,
    bold,
    width,
    left: MARGIN,
    safe,
    get page() {
      return page;
    },
    heading(text: string, size = 13) {
      ensure(size + 24);
      y -= size + 6;
      put(fit(text, bold, size, width), MARGIN, y, size, bold);
      y -= 6;
    },
    paragraph(text: string, o: { size?: number; bullet?: boolean; grey?: boolean; bold?: boolean } = {}) {
      const size = o.size ?? 9;
      const f = o.bold ? bold : font;
      const indent = o.bullet ? 10 : 0;
      for (const [i, line] of wrap(text, f, size, width - indent).entries()) {
        ensure(size + 4);
        y -= size + 3;
        if (o.bullet && i === 0) put("•", MARGIN, y, size);
        put(line, MARGIN + indent, y, size, f, o.grey ? GREY : INK);
      }
      y -= 3;
    },
    gap(points: number) {
      y -= points;
    },
    /** A table; rows are already formatted text. The heading row repeats on every new page. */
    table(columns: Column[], rows: string[][], size = 7.5) {
      const rowH = size + 5;
      const header = () => {
        ensure(rowH * 2);
        let x = MARGIN;
        y -= rowH;
        for (const c of columns) {
          const t = fit(c.title, bold, size, c.width - 4);
          const tx = c.align === "right" ? x + c.width - 2 - textWidth(t, bold, size) : x + 2;
          put(t, tx, y + 3, size, bold);
          x += c.width;
        }
        page.drawLine({ start: { x: MARGIN, y }, end: { x: MARGIN + total, y }, thickness: 0.6, color: INK });
      };
      const total = columns.reduce((t, c) => t + c.width, 0);
      header();
      rows.forEach((cells, r) => {
        if (y - rowH < MARGIN + 18) {
          newPage();
          header();
        }
        y -= rowH;
        if (r % 2 === 1) page.drawRectangle({ x: MARGIN, y, width: total, height: rowH, color: STRIPE });
        let x = MARGIN;
        cells.forEach((cell, i) => {
          const c = columns[i];
          const t = fit(cell, font, size, c.width - 4);
          const tx = c.align === "right" ? x + c.width - 2 - textWidth(t, font, size) : x + 2;
          put(t, tx, y + 3, size);
          x += c.width;
        });
      });
      page.drawLine({ start: { x: MARGIN, y }, end: { x: MARGIN + total, y }, thickness: 0.4, color: RULE });
      y -= 6;
    },
    /**
     * Reserves a box across the page and hands it to `draw`: the rest of this page when at least
     * `min` points are left (at most `height`), else `height` points on a new page.
     */
    box(
      height: number,
      draw: (page: PDFPage, box: { x: number; y: number; w: number; h: number }) => void,
      min = height,
    ) {
      const left = y - MARGIN - 24;
      if (left >= min) height = Math.min(height, left);
      else ensure(height + 6);
      y -= height;
      draw(page, { x: MARGIN, y, w: width, h: height });
      y -= 6;
    },
    async save(): Promise<Uint8Array> {
      flush();
      const pages = pdf.getPages();
      pages.forEach((p, i) => {
        const text = fit(`${opts.footer} · page ${i + 1} of ${pages.length}`, font, 7, width);
        p.drawText(text, { x: MARGIN, y: MARGIN - 14, size: 7, font, color: GREY });
      });
      return pdf.save();
    },
  };
  sheet.heading(opts.title, 16);
  return sheet;
}

/** A PDF download response. */
export function pdfResponse(bytes: Uint8Array, fileName: string): Response {
  return new Response(bytes as Uint8Array<ArrayBuffer>, {
    headers: {
      "Content-Type": "application/pdf",
      "Content-Disposition": `attachment; filename="${fileName}"`,
      "Content-Length": String(bytes.byteLength),
      "Cache-Control": "private, no-cache",
      "X-Content-Type-Options": "nosniff",
    },
  });
}
