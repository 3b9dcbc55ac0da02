import type { Sequelize } from 'sequelize';
import type { Config } from '../config';
import type { Mailer } from '../mail/transport';
import { runReminderCycle } from '../services/reminders';

export type Job = {
  /** No new runs start; resolves once a run in progress has finished. */
  stop(): Promise<void>;
};

/**
 * Runs `task` every `intervalMs`, each wait stretched or shortened by up to `jitter` (a fraction)
 * so several instances started together do not all hit the database at the same moment. Runs
 * never overlap: the next wait starts when a run ends. A failed run is reported and the job goes on.
 */
export function startJob({
  intervalMs,
  task,
  jitter = 0.1,
  onError,
}: {
  intervalMs: number;
  task: () => Promise<unknown>;
  jitter?: number;
  onError: (error: unknown) => void;
}): Job {
  let stopped = false;
  let timer: NodeJS.Timeout | null = null;
  let running: Promise<void> | null = null;

  const schedule = (delay: number) => {
    if (stopped) return;
    timer = setTimeout(tick, delay);
  };
  const nextDelay = () => Math.max(0, intervalMs * (1 + jitter * (2 * Math.random() - 1)));
  const tick = () => {
    timer = null;
    running = task()
      .then(() => undefined, onError)
      .finally(() => {
        running = null;
        schedule(nextDelay());
      });
  };

  // The first run comes soon after start-up, spread over a slice of the interval.
  schedule(intervalMs * jitter * Math.random());
  return {
    async stop() {
      stopped = true;
      if (timer) clearTimeout(timer);
      timer = null;
      await running;
    },
  };
}

/** The reminder digests of services/reminders.ts on the configured interval. */
export function startReminderJob({
  config,
  sequelize,
  mailer,
  publicUrl,
}: {
  config: Config;
  sequelize: Sequelize;
  mailer: Mailer;
  publicUrl: string;
}): Job {
  return startJob({
    intervalMs: config.reminders.intervalMs,
    task: () =>
      runReminderCycle({
        instanceId: config.instanceId,
        sequelize,
        mailer,
        publicUrl,
        maxAttempts: config.reminders.maxAttempts,
      }),
    onError: (error) =>
      console.error(
        `Reminder e-mails: this run failed and the next one will try again (${
          error instanceof Error ? error.message : String(error)
        })`,
      ),
  });
}
