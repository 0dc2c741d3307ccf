// Text of a PDF, page by page, read with pdfjs-dist (the reference PDF reader
// of the web platform), so browser tests can check what a printout says.
export async function pdfText(data: Uint8Array): Promise<string> {
  return (await pdfPages(data)).join("\n").replace(/[ \t]+/g, " ");
}

/** The text of each page of a PDF, in order (so a test can count pages and see what is on which). */
export async function pdfPages(data: Uint8Array): Promise<string[]> {
  const pdfjs = await import("pdfjs-dist/legacy/build/pdf.mjs");
  const doc = await pdfjs.getDocument({ data, disableFontFace: true, useSystemFonts: false, isEvalSupported: false }).promise;
  const pages: string[] = [];
  for (let n = 1; n <= doc.numPages; n++) {
    const content = await (await doc.getPage(n)).getTextContent();
    pages.push(content.items.map((item) => ("str" in item ? item.str + (item.hasEOL ? "\n" : "") : "")).join(""));
  }
  await doc.destroy();
  return pages;
}
