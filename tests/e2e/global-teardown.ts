import fs from 'node:fs';

export default async function globalTeardown(): Promise<void> {
  const pid = Number(process.env.E2E_SERVER_PID);
  if (pid) {
    try {
      process.kill(pid, 'SIGTERM');
    } catch {
      // Already gone.
    }
  }
  if (process.env.E2E_DATA_DIR) fs.rmSync(process.env.E2E_DATA_DIR, { recursive: true, force: true });
}
