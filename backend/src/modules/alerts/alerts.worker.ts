import type { AppConfig } from '../../config';
import { QUEUES, type JobQueue } from '../../queue/job-queue';
import { fanOutChange, sendDigests, type AlertDeps } from './alerts.service';

/**
 * Fan-out and digest jobs in this process, and the digest's daily schedule (kept in the database, so any number
 * of processes scheduling it still send one digest job per day).
 */
export async function startAlertWorkers(deps: AlertDeps, queue: JobQueue, alerts: AppConfig['alerts'], { schedule = true } = {}) {
  if (schedule) await queue.schedule(QUEUES.alertDigest, alerts.digestCron);
  if (alerts.workers <= 0) return;
  await queue.work<{ changeId: string }>(QUEUES.fanOutPartChange, alerts.workers, async ({ changeId }) => {
    await fanOutChange(deps, changeId);
  });
  await queue.work(QUEUES.alertDigest, 1, async () => {
    const result = await sendDigests(deps, new Date());
    // The stamped ones are done; failing the job retries only the people whose mail was refused.
    if (result.failed) throw new Error(`${result.failed} alert digests were not accepted by the mail server.`);
  });
}
