/**
 * `npm run bench:quality`: the quality rules (too short, overlapping, out of hours, bursts) and
 * the interviewer-answers test (CMH by cell, BH) over a generated project of 100,000 interviews
 * by 120 interviewers across 21 cells, in memory: the computation a recompute does once the
 * interviews are read. Reports the median of 5 runs.
 */
import { performance } from 'node:perf_hooks';
import { seeded } from '../api/src/demo/vellmoor.js';
import { interviewerAnswerTests, type AnsweredComplete } from '../api/src/quality/interviewer-answers.js';
import { timingFindings, type TimedInterview } from '../api/src/quality/interview-rules.js';
import { DEFAULT_QUALITY_SETTINGS } from '../api/src/quality/quality-settings.js';

const N = Number(process.env.BENCH_ROWS ?? 100_000);
const random = seeded(2026);
const interviews: TimedInterview[] = [];
const answers: AnsweredComplete[] = [];
const start = Date.parse('2026-11-02T08:00:00Z');
for (let i = 0; i < N; i++) {
  const interviewerId = `iv${Math.floor(random() * 120)}`;
  const startedAt = new Date(start + Math.floor(random() * 28 * 86_400_000));
  const minutes = 5 + random() * 30;
  const disposition = random() < 0.6 ? 'complete' : 'refusal';
  interviews.push({ id: `i${i}`, interviewerId, disposition, startedAt, endedAt: new Date(startedAt.getTime() + minutes * 60_000) });
  if (disposition === 'complete') answers.push({ interviewerId, stratum: `c${Math.floor(random() * 21)}`, yes: random() < 0.5 });
}

const times: number[] = [];
let flagged = 0;
for (let run = 0; run < 5; run++) {
  const t0 = performance.now();
  const findings = timingFindings(interviews, DEFAULT_QUALITY_SETTINGS, 'Europe/London');
  const tests = interviewerAnswerTests(answers, DEFAULT_QUALITY_SETTINGS.interviewerAnswers);
  times.push(performance.now() - t0);
  flagged = findings.size + tests.filter((t) => t.flagged).length;
}
times.sort((a, b) => a - b);
console.log(`${N.toLocaleString('en-GB')} interviews, ${answers.length.toLocaleString('en-GB')} completes: rules and interviewer test in ${(times[2]! / 1000).toFixed(2)} s (median of 5); ${flagged} findings`);
