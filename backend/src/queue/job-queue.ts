import PgBoss from 'pg-boss';
import type { EntityManager } from 'typeorm';

/**
 * Background jobs on the application's own PostgreSQL (pg-boss): any number of processes can work the same
 * queues, and a job is sent in the same transaction as the rows it is about, so neither exists without the other.
 */
export interface JobQueue {
  start(): Promise<void>;
  send(name: string, data: object, tx?: EntityManager): Promise<void>;
  /** Runs `handler` for each job, `concurrency` at a time in this process. */
  work<T extends object>(name: string, concurrency: number, handler: (data: T) => Promise<void>): Promise<void>;
  /** Sends a job to `name` on a cron schedule (UTC); scheduling the same queue again replaces the schedule. */
  schedule(name: string, cron: string, data?: object): Promise<void>;
  stop(): Promise<void>;
}

export const QUEUES = { parseDatasheet: 'parse-datasheet', fanOutPartChange: 'fan-out-part-change', alertDigest: 'alert-digest' } as const;

type QueueName = (typeof QUEUES)[keyof typeof QUEUES];

interface QueueOptions {
  retryLimit: number;
  retryDelay?: number;
  retryBackoff?: boolean;
  expireInSeconds: number;
}

/** A crashed worker's job expires after five minutes and is tried again, twice at most. */
const DEFAULT_QUEUE_OPTIONS: QueueOptions = { retryLimit: 2, expireInSeconds: 300 };

/** Alert jobs mostly fail because the mail server is away, so they wait between tries (30 s doubling, about 15 minutes). */
const QUEUE_OPTIONS: Partial<Record<QueueName, QueueOptions>> = {
  'fan-out-part-change': { retryLimit: 5, retryDelay: 30, retryBackoff: true, expireInSeconds: 300 },
  'alert-digest': { retryLimit: 5, retryDelay: 30, retryBackoff: true, expireInSeconds: 900 },
};

/** `namespace` prefixes every queue name, so test contexts sharing one database never take each other's jobs. */
export function createJobQueue(databaseUrl: string, { pollSeconds = 1, namespace = '' } = {}): JobQueue {
  const queueName = (name: string) => `${namespace}${name}`;
  const boss = new PgBoss({ connectionString: databaseUrl, schema: 'pgboss', max: 3, application_name: 'understudy-jobs' });
  // pg-boss reports connection trouble as events; without a listener an 'error' event would end the process.
  boss.on('error', (err) => console.warn('[jobs]', err.message));
  let started: Promise<void> | null = null;

  return {
    start() {
      started ??= (async () => {
        await boss.start();
        for (const base of Object.values(QUEUES)) {
          const name = queueName(base);
          if (!(await boss.getQueue(name))) await boss.createQueue(name, { name, ...(QUEUE_OPTIONS[base] ?? DEFAULT_QUEUE_OPTIONS) });
        }
      })();
      return started;
    },
    async send(name, data, tx) {
      await this.start();
      const db = tx?.queryRunner
        ? { executeSql: async (text: string, values: unknown[]) => ({ rows: (await tx.queryRunner!.query(text, values, true)).records }) }
        : undefined;
      await boss.send(queueName(name), data, db ? { db } : {});
    },
    async work(name, concurrency, handler) {
      await this.start();
      for (let i = 0; i < concurrency; i++) {
        await boss.work<object>(queueName(name), { pollingIntervalSeconds: pollSeconds, batchSize: 1 }, async (jobs) => {
          for (const job of jobs) await handler(job.data as never);
        });
      }
    },
    async schedule(name, cron, data = {}) {
      await this.start();
      await boss.schedule(queueName(name), cron, data, { tz: 'UTC' });
    },
    async stop() {
      if (!started) return;
      await started.catch(() => undefined);
      await boss.stop({ graceful: true, timeout: 5_000, wait: true });
    },
  };
}
