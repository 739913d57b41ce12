// GET /projects/:id/interviewers/rates: each interviewer's contacts, outcome mix and AAPOR
// cooperation, refusal and contact rates (e once per project), per field day too, with their
// median complete duration, flags and back-check results. Every figure comes from grouped counts.
import { Injectable } from '@nestjs/common';
import type { AuthUser } from '../common/roles.js';
import { ProjectAccess } from '../projects/project-access.service.js';
import { contactFigures, projectE, SHOWN_RATES, type ContactFigures, type ShownRate } from './interviewer-rates.js';
import { RatesRepository, type BackcheckTally, type ContactGroup } from './rates.repository.js';

export interface InterviewerDay extends ContactFigures {
  fieldDay: string;
  medianDurationSeconds: number | null;
}

export interface InterviewerRates extends ContactFigures {
  interviewerId: string;
  name: string;
  medianDurationSeconds: number | null;
  /** Timing-rule findings on their interviews not approved, per rule. */
  findings: { rule: string; count: number }[];
  /** Their headline-answer test (Cochran–Mantel–Haenszel with Benjamini–Hochberg); null when not tested. */
  test: { completes: number; pValue: number | null; adjustedPValue: number | null; flagged: boolean; reason: string } | null;
  backchecks: Omit<BackcheckTally, 'interviewerId'>;
  days: InterviewerDay[];
}

export interface ProjectInterviewerRates {
  projectId: string;
  /** The eligible share of unknown-eligibility cases, from the whole project; null before any resolved case. */
  e: number | null;
  rateNames: ShownRate[];
  project: ContactFigures;
  interviewers: InterviewerRates[];
}

const NO_BACKCHECKS = { selected: 0, confirmed: 0, notConfirmed: 0, notReached: 0, pending: 0 };

function byKey<T>(rows: T[], key: (row: T) => string): Map<string, T[]> {
  const map = new Map<string, T[]>();
  for (const row of rows) {
    const list = map.get(key(row));
    if (list) list.push(row);
    else map.set(key(row), [row]);
  }
  return map;
}

@Injectable()
export class RatesService {
  constructor(
    private readonly access: ProjectAccess,
    private readonly repository: RatesRepository,
  ) {}

  async rates(user: AuthUser, projectId: string): Promise<ProjectInterviewerRates> {
    await this.access.find(user, projectId);
    const [people, contacts, medians, findings, tests, backchecks] = await Promise.all([
      this.repository.interviewers(projectId),
      this.repository.contacts(projectId),
      this.repository.medianDurations(projectId),
      this.repository.findings(projectId),
      this.repository.tests(projectId),
      this.repository.backchecks(projectId),
    ]);
    const e = projectE(contacts);
    const median = new Map(medians.map((m) => [`${m.interviewerId}|${m.fieldDay ?? ''}`, m.seconds]));
    const contactsOf = byKey(contacts, (c) => c.interviewerId);
    const findingsOf = byKey(findings, (f) => f.interviewerId);
    const testOf = new Map(tests.map((t) => [t.interviewer_id, t]));
    const backchecksOf = new Map(backchecks.map((b) => [b.interviewerId, b]));
    const interviewers = people.map((person): InterviewerRates => {
      const mine = contactsOf.get(person.id) ?? [];
      const test = testOf.get(person.id);
      const { interviewerId: _id, ...tally } = backchecksOf.get(person.id) ?? { interviewerId: person.id, ...NO_BACKCHECKS };
      return {
        interviewerId: person.id,
        name: person.name,
        ...contactFigures(mine, e),
        medianDurationSeconds: median.get(`${person.id}|`) ?? null,
        findings: (findingsOf.get(person.id) ?? []).map(({ rule, count }) => ({ rule, count })).sort((a, b) => a.rule.localeCompare(b.rule)),
        test: test
          ? { completes: test.completes, pValue: test.p_value, adjustedPValue: test.adjusted_p_value, flagged: test.flagged, reason: test.reason }
          : null,
        backchecks: tally,
        days: days(mine, e, (day) => median.get(`${person.id}|${day}`) ?? null),
      };
    });
    return { projectId, e, rateNames: [...SHOWN_RATES], project: contactFigures(contacts, e), interviewers };
  }
}

function days(contacts: ContactGroup[], e: number | null, medianOf: (day: string) => number | null): InterviewerDay[] {
  return [...byKey(contacts, (c) => c.fieldDay)]
    .sort(([a], [b]) => a.localeCompare(b))
    .map(([fieldDay, groups]) => ({ fieldDay, ...contactFigures(groups, e), medianDurationSeconds: medianOf(fieldDay) }));
}
