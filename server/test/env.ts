import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

// Test environment defaults; DATABASE_URL comes from the runner (a fresh database per run).
process.env.JWT_SECRET ??= 'yardcall-e2e-secret-0123456789abcdef';
process.env.PUBLIC_URL ??= 'http://yardcall.example.test';
// Never serve a real client build during tests unless a test sets its own folder.
process.env.CLIENT_DIST ??= '/nonexistent/yardcall-client-dist';
delete process.env.SMTP_URL;
// Uploaded notes and photos go to a throw-away folder, not the demo's .data/objects.
process.env.STORAGE_DIR ??= mkdtempSync(join(tmpdir(), 'yardcall-e2e-objects-'));
