import { QUEUES, type JobQueue } from '../../queue/job-queue';
import { runParseJob, type DatasheetDeps } from './datasheets.service';

/** Parse jobs in this process; more processes can call this against the same database to share the load. */
export async function startDatasheetWorkers(deps: Pick<DatasheetDeps, 'db' | 'storage' | 'limits'>, queue: JobQueue, count: number) {
  if (count <= 0) return;
  await queue.work<{ datasheetId: string }>(QUEUES.parseDatasheet, count, ({ datasheetId }) => runParseJob(deps, datasheetId));
}
