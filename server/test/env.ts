// Test environment defaults; DATABASE_URL comes from the runner (a fresh database per run).
process.env.JWT_SECRET ??= 'yardcall-e2e-secret-0123456789abcdef';
process.env.PUBLIC_URL ??= 'http://yardcall.example.test';
// Never serve a real client build during tests unless a test sets its own folder.
process.env.CLIENT_DIST ??= '/nonexistent/yardcall-client-dist';
delete process.env.SMTP_URL;
