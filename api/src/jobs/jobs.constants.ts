/** Injection token of the one JobQueue of the process. */
export const JOB_QUEUE = Symbol('JOB_QUEUE');
