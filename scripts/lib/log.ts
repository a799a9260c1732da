export function say(message: string): void {
  console.log(`[yardcall] ${message}`);
}

export function fail(message: string): never {
  console.error(`[yardcall] ${message}`);
  process.exit(1);
}
