import { stopAllChildren } from "./processes";

/**
 * Stops what a command started, in order: child processes (Next), the fake SMTP server and the other
 * local fakes, then PostgreSQL (also when it was still starting). One failure never skips the rest.
 */
export async function stopServices(started: {
  smtp?: { stop(): Promise<void> };
  providers?: { stop(): Promise<void> };
  pgStarting?: Promise<{ stop(): Promise<void> }>;
}): Promise<void> {
  const steps: (() => Promise<unknown>)[] = [
    () => stopAllChildren(),
    async () => {
      await started.smtp?.stop();
      await started.providers?.stop();
    },
    async () => (await started.pgStarting?.catch(() => undefined))?.stop(),
  ];
  for (const step of steps) {
    try {
      await step();
    } catch (err) {
      console.error(err);
    }
  }
}
