// GET /api/projects/:id/review/decisions.csv: the whole audit trail as a CSV file, saved on the
// device through a temporary link (the request needs the sign-in, so a plain link would not do).
import { apiFile } from '../../../lib/api-client';

export async function downloadDecisions(projectId: string, projectName: string): Promise<void> {
  const blob = await apiFile(`/projects/${projectId}/review/decisions.csv`);
  const url = URL.createObjectURL(blob);
  const link = document.createElement('a');
  link.href = url;
  link.download = `${projectName.replace(/[^\w.-]+/g, '-')}-review-decisions.csv`;
  document.body.append(link);
  link.click();
  link.remove();
  setTimeout(() => URL.revokeObjectURL(url), 1000);
}
