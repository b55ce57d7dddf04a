import { spawn, type ChildProcess } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';

/** USER_HZ: the unit of /proc/<pid>/stat times; 100 on every Linux build in common use. */
const CLOCK_TICKS_PER_SECOND = 100;

/** Runs the real server (server/index.ts under node with tsx's loader) as a separate process, so a test can kill -9 it. */
export class AppProcess {
  private child: ChildProcess | null = null;
  constructor(private readonly root: string, private readonly env: Record<string, string>) {}

  get url() {
    return this.env.PUBLIC_URL;
  }

  async start(timeoutMs = 30_000) {
    // Something still answering on the port would be mistaken for the new process.
    const stale = await fetch(`${this.url}/api/health`, { signal: AbortSignal.timeout(500) }).catch(() => null);
    if (stale) throw new Error(`${this.url} already answers: an earlier app process is still running`);
    // One process, node with tsx's loader (not the tsx wrapper, whose child would survive a SIGKILL).
    this.child = spawn(process.execPath, [...(process.env.GELWRIGHT_NODE_FLAGS ?? '').split(' ').filter(Boolean), '--import', 'tsx', join(this.root, 'server', 'index.ts')], {
      cwd: this.root,
      env: { ...process.env, ...this.env },
      stdio: ['ignore', 'ignore', 'pipe'],
    });
    let stderr = '';
    this.child.stderr?.on('data', (chunk) => (stderr = (stderr + chunk).slice(-4000)));
    const deadline = Date.now() + timeoutMs;
    while (Date.now() < deadline) {
      if (this.child.exitCode !== null) throw new Error(`the app exited at start-up:\n${stderr}`);
      try {
        const response = await fetch(`${this.url}/api/health`, { signal: AbortSignal.timeout(1000) });
        if (response.status === 200) return;
      } catch {
        /* not listening yet */
      }
      await new Promise((r) => setTimeout(r, 150));
    }
    throw new Error(`the app did not answer within ${timeoutMs / 1000} s:\n${stderr}`);
  }

  /**
   * CPU time the app process has used so far, in seconds (user + system, from /proc on Linux;
   * null elsewhere or when it is not running): the benchmark divides it by the requests served.
   */
  cpuSeconds(): number | null {
    const pid = this.child?.pid;
    if (pid === undefined || process.platform !== 'linux') return null;
    try {
      // Fields after the command name (which may hold spaces, hence the last ')'): utime and stime are the 12th and 13th.
      const fields = readFileSync(`/proc/${pid}/stat`, 'utf8').split(')').pop()!.trim().split(' ');
      return (Number(fields[11]) + Number(fields[12])) / CLOCK_TICKS_PER_SECOND;
    } catch {
      return null;
    }
  }

  kill9() {
    this.child?.kill('SIGKILL');
    return new Promise<void>((resolve) => {
      if (!this.child || this.child.exitCode !== null || this.child.signalCode !== null) return resolve();
      this.child.once('exit', () => resolve());
    });
  }

  async stop() {
    if (!this.child || this.child.exitCode !== null) return;
    this.child.kill('SIGTERM');
    await new Promise<void>((resolve) => {
      const timer = setTimeout(() => {
        this.child?.kill('SIGKILL');
        resolve();
      }, 5000);
      this.child!.once('exit', () => {
        clearTimeout(timer);
        resolve();
      });
    });
  }
}
