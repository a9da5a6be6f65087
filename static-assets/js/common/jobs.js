// The one way a page follows a solve job: the solve's POST answers 202 with the job, then
// GET /api/v1/inverse/jobs/{id} is polled until the job is finished (succeeded, failed or cancelled),
// and DELETE on the same path cancels it. A later poll (after a cancel) always speaks instead of an
// earlier one, and a refused or lost poll is handed to the page, never swallowed.
import { getJson, sendJson } from './api.js';

export const JOBS_PATH = '/api/v1/inverse/jobs/';

const lost = (error) => ({ ok: false, status: String(error), data: null, problem: { detail: String(error) } });

/** Calls the server at once; a throw or a rejection becomes a lost answer. */
function ask(call, url) {
  try {
    return Promise.resolve(call(url)).catch(lost);
  } catch (error) {
    return Promise.resolve(lost(error));
  }
}

/**
 * createJobFollower({interval, progress, finished, failed}) → {follow(id), cancel(), poll(), running}
 * - progress(job): each poll's job while it is queued or running (the next poll follows after interval ms);
 * - finished(job): the job once it is succeeded, failed or cancelled (the follower is then idle);
 * - failed(answer): a poll refused ({ok: false, status, problem}) or lost; polling stops, the job is still
 *   followed (cancel() or poll() ask again).
 * get and del are the HTTP calls (the api.js ones unless a test gives its own).
 */
export function createJobFollower({
  interval = 250, progress = () => {}, finished, failed = () => {},
  get = getJson, del = (url) => sendJson('DELETE', url),
}) {
  let id = null;
  let timer = null;
  let ticket = 0;

  async function poll() {
    if (!id) return;
    clearTimeout(timer);
    const mine = ++ticket;
    const answer = await ask(get, JOBS_PATH + encodeURIComponent(id));
    if (mine !== ticket || !id) return; // a later poll (after a cancel) speaks instead
    if (!answer.ok) {
      failed(answer);
      return;
    }
    const job = answer.data;
    if (job.status === 'queued' || job.status === 'running') {
      progress(job);
      timer = setTimeout(poll, interval);
      return;
    }
    id = null;
    finished(job);
  }

  return {
    /** Follows a job from its id (the POST's answer.data.id), polling at once. */
    follow(jobId) {
      id = jobId;
      return poll();
    },
    /**
     * Asks the server to cancel the job and polls it at once: a queued job is cancelled at once, a running one at
     * its next evaluation, and the polls go on until the job says so. Resolves to the DELETE's answer (null when
     * no job is followed); a refused or lost cancel is for the page to say, and the job is still followed.
     */
    async cancel() {
      if (!id) return null;
      clearTimeout(timer);
      const answer = await ask(del, JOBS_PATH + encodeURIComponent(id));
      poll();
      return answer;
    },
    poll,
    get running() { return id !== null; },
  };
}
