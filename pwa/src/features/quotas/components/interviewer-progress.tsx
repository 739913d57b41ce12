import { formatCount } from '../../../lib/format';
import type { InterviewerProgress } from '../api/get-quota-board';
import { ScrollBox } from '../../../components/scroll-box';
import { heading, WORDS } from '../../../lib/glossary';

/** Completes per interviewer: today and in total (staff data, never shown to clients). */
export function InterviewerProgressTable({ interviewers }: { interviewers: InterviewerProgress[] }) {
  if (interviewers.length === 0) {
    return <p className="pl-muted">No interviewers are assigned to this project yet.</p>;
  }
  return (
    <ScrollBox label="Interviewers, scrolls sideways">
      <table className="pl-table" aria-label="Interviewers">
        <thead>
          <tr>
            <th scope="col">Interviewer</th>
            <th scope="col" className="is-numeric">Today</th>
            <th scope="col" className="is-numeric">In total</th>
            <th scope="col" className="is-numeric">{heading(WORDS.contact.many)}</th>
            <th scope="col" className="is-numeric">{heading(WORDS.overQuota.one)}</th>
          </tr>
        </thead>
        <tbody>
          {interviewers.map((person) => (
            <tr key={person.id}>
              <th scope="row">{person.name}</th>
              <td className="is-numeric pl-figure">{formatCount(person.completesToday)}</td>
              <td className="is-numeric pl-figure">{formatCount(person.completesTotal)}</td>
              <td className="is-numeric pl-figure">{formatCount(person.contactsTotal)}</td>
              <td className="is-numeric pl-figure">{formatCount(person.overQuota)}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </ScrollBox>
  );
}
