// After the faults: what was sent against what is stored, and the board, the balance and a
// direct count(*) of counted interviews against each other.
import type { Knex } from 'knex';
import type { Device, Interview, Ledger } from './device.js';

interface Inputs {
  db: Knex;
  projectId: string;
  sent: Map<string, Interview>;
  devices: Device[];
  ledger: Ledger;
  board: { cells: { kind: string; achieved: number }[]; interviewers: { completesTotal: number }[] };
  balance: { n: number };
}

export async function reconcile({ db, projectId, sent, devices, ledger, board, balance }: Inputs) {
  const rows = await db('interviews').where({ project_id: projectId }).select('id');
  const stored = new Set(rows.map((r) => r.id as string));
  const { n } = (await db('interviews')
    .where({ project_id: projectId, disposition: 'complete' })
    .whereNot({ review_status: 'rejected' })
    .count({ n: '*' })
    .first()) as { n: string };

  const summary = {
    sent: sent.size,
    submissions: devices.reduce((sum, d) => sum + d.initial, 0),
    stored: rows.length,
    duplicated: rows.length - stored.size + [...ledger.accepted.values()].filter((times) => times > 1).length,
    lost: [...sent.keys()].filter((id) => !stored.has(id)).length,
    unexpected: [...stored].filter((id) => !sent.has(id)).length,
    stillInAnOutbox: devices.reduce((sum, d) => sum + d.waiting, 0),
    rejected: ledger.rejected.size,
    /** Stored, but every reply that said "accepted" was lost: the retry was answered duplicate. */
    acceptedReplyLost: [...sent.keys()].filter((id) => stored.has(id) && !ledger.accepted.has(id)).length,
    sentCompletes: [...sent.values()].filter((i) => i.disposition === 'complete').length,
    countedCompletes: Number(n),
    boardCompletes: board.interviewers.reduce((sum, i) => sum + i.completesTotal, 0),
    boardInterlockedCells: board.cells.filter((c) => c.kind === 'interlocked').reduce((sum, c) => sum + c.achieved, 0),
    balanceN: balance.n,
  };

  const problems: string[] = [];
  if (summary.lost) problems.push(`${summary.lost} interviews lost`);
  if (summary.duplicated) problems.push(`${summary.duplicated} interviews stored or accepted twice`);
  if (summary.unexpected) problems.push(`${summary.unexpected} stored interviews nobody sent`);
  if (summary.stillInAnOutbox) problems.push(`${summary.stillInAnOutbox} interviews never acknowledged`);
  if (summary.rejected) problems.push(`${summary.rejected} interviews rejected: ${[...ledger.rejected.values()][0]}`);
  // During an outage the API answers 503 or nothing at all: a 401 or a 500 is a finding.
  const other = Object.entries(ledger.failures).filter(([kind]) => kind !== '503' && !kind.startsWith('no answer'));
  if (other.length) problems.push(`unexpected answers during the faults: ${other.map(([k, n]) => `${k} × ${n}`).join(', ')}`);
  const completes = [summary.sentCompletes, summary.countedCompletes, summary.boardCompletes, summary.boardInterlockedCells, summary.balanceN];
  if (new Set(completes).size !== 1) problems.push(`completes disagree (sent, count(*), board, board cells, balance): ${completes.join(', ')}`);
  return { summary, problems };
}
