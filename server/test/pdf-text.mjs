// Prints the text of a PDF read from stdin, one line per page, for the report tests. Plain Node
// runs it: pdfjs-dist is ESM only, which Jest's CommonJS runtime cannot load.
import { getDocument } from 'pdfjs-dist/legacy/build/pdf.mjs';

const chunks = [];
for await (const chunk of process.stdin) chunks.push(chunk);
const pdf = await getDocument({ data: new Uint8Array(Buffer.concat(chunks)), useSystemFonts: false }).promise;
const pages = [];
for (let n = 1; n <= pdf.numPages; n += 1) {
  const content = await (await pdf.getPage(n)).getTextContent();
  pages.push(content.items.map((item) => ('str' in item ? item.str + (item.hasEOL ? '\n' : '') : '')).join(''));
}
process.stdout.write(JSON.stringify({ pages: pdf.numPages, text: pages.join('\n') }));
