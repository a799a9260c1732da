// Test support for the command-line faces: run one with JSON lines on stdin and read its JSON lines back.
import { spawn } from 'node:child_process';

export interface JsonLinesRun {
  code: number | null;
  lines: unknown[];
  stderr: string;
}

// One line a value; a string stands for itself (a line that is not JSON, for the error path).
export function jsonLines(values: readonly unknown[]): string {
  return `${values.map((value) => (typeof value === 'string' ? value : JSON.stringify(value))).join('\n')}\n`;
}

export function runJsonLines(
  command: string,
  args: readonly string[],
  input: string,
  cwd?: string,
): Promise<JsonLinesRun> {
  return new Promise((resolve, reject) => {
    const child = spawn(command, args, { cwd, stdio: ['pipe', 'pipe', 'pipe'] });
    let stdout = '';
    let stderr = '';
    child.stdout.on('data', (chunk: Buffer) => (stdout += chunk.toString()));
    child.stderr.on('data', (chunk: Buffer) => (stderr += chunk.toString()));
    child.on('error', reject);
    child.on('close', (code) => {
      const lines = stdout
        .split('\n')
        .filter((line) => line.trim() !== '')
        .map((line) => JSON.parse(line) as unknown);
      resolve({ code, lines, stderr });
    });
    child.stdin.end(input);
  });
}
