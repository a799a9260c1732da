import { execFile } from 'node:child_process';
import { join } from 'node:path';

export interface PdfText {
  pages: number;
  text: string;
}

// Extracts a PDF's text with pdfjs-dist in a child Node process (see pdf-text.mjs).
export function pdfText(pdf: Buffer): Promise<PdfText> {
  return new Promise((resolve, reject) => {
    const child = execFile(
      process.execPath,
      [join(__dirname, 'pdf-text.mjs')],
      { maxBuffer: 16 * 1024 * 1024 },
      (error, stdout, stderr) => {
        if (error) reject(new Error(`pdf-text failed: ${stderr || error.message}`));
        else resolve(JSON.parse(stdout) as PdfText);
      },
    );
    child.stdin?.end(pdf);
  });
}

// Line breaks fall wherever the page width puts them: compare text without whitespace.
export function squash(text: string): string {
  return text.replace(/\s+/g, '');
}
