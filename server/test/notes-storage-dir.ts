import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

// Imported before the app: this suite's uploads go to a folder of its own, which starts missing.
export const NOTES_STORAGE_DIR = join(mkdtempSync(join(tmpdir(), 'yardcall-notes-')), 'objects');
process.env.STORAGE_DIR = NOTES_STORAGE_DIR;
