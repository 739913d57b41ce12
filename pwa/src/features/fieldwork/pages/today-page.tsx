// The interviewer's home: assigned projects from the device's cache, each with the way to
// log a contact. Works offline once the device has synced one time. A contact left half
// logged (a reload, a crash) opens again at the same step; one older than a day asks first.
import { useState } from 'react';
import '../fieldwork.css';
import { PageFrame } from '../../../components/page-frame';
import { EmptyPanel, LoadingPanel, OfflinePanel } from '../../../components/state-panels';
import { discardDraft, isStale, useDraft } from '../../../db/draft-store';
import { isRejected } from '../../../db/outbox-store';
import { useOnline } from '../../../hooks/use-online';
import { useSyncProgress } from '../../../sync/sync-progress';
import { useBackgroundSync } from '../../../sync/use-background-sync';
import { DraftPrompt } from '../components/draft-prompt';
import { LogContact } from '../components/log-contact';
import { ProjectCard } from '../components/project-card';
import { SyncLine } from '../components/sync-line';
import { useFieldStatus } from '../hooks/use-field-status';

export function TodayPage() {
  useBackgroundSync();
  const field = useFieldStatus();
  const online = useOnline();
  const progress = useSyncProgress();
  const [logging, setLogging] = useState<string | null>(null);
  const [saved, setSaved] = useState<string>();
  const draft = useDraft(field?.userId);
  // The draft just saved or cancelled may still be read for a moment after it is gone.
  const [closedDraft, setClosedDraft] = useState<string>();
  const [finishOld, setFinishOld] = useState(false);
  const openDraft = draft && draft.startedAt !== closedDraft ? draft : undefined;
  const draftProject = openDraft ? field?.projects.find((p) => p.id === openDraft.projectId) : undefined;
  const resume = openDraft && draftProject && (finishOld || !isStale(openDraft)) ? openDraft : undefined;

  function close(startedAt: string | undefined, message?: string) {
    setClosedDraft(startedAt);
    setFinishOld(false);
    setLogging(null);
    if (message) setSaved(message);
  }

  const project = field?.projects.find((p) => p.id === (logging ?? resume?.projectId));
  if (field && project) {
    return (
      <PageFrame title="Log a contact">
        <LogContact
          key={project.id}
          userId={field.userId}
          project={project}
          status={field.cells[project.id]}
          draft={logging ? undefined : resume}
          onCancel={(startedAt) => close(startedAt)}
          onSaved={(message, startedAt) => close(startedAt, message)}
        />
      </PageFrame>
    );
  }
  if (field && openDraft) {
    return (
      <PageFrame title="Today">
        <DraftPrompt
          draft={openDraft}
          projectName={draftProject?.name}
          onFinish={() => setFinishOld(true)}
          onDiscard={() => void discardDraft(field.userId).then(() => close(openDraft.startedAt))}
        />
      </PageFrame>
    );
  }

  const waiting = field?.entries.filter((e) => !isRejected(e)).length ?? 0;
  return (
    <PageFrame title="Today">
      {!field || draft === undefined ? (
        <LoadingPanel what="your projects" />
      ) : (
        <>
          {saved ? (
            <p className="pl-saved" role="status">
              {saved} {online ? 'Sending it now.' : 'It goes to the office when the network is back.'}
            </p>
          ) : null}
          <SyncLine waiting={waiting} lastSync={field.lastSync} />
          {field.projects.length > 0 ? (
            <ul className="pl-card-list" aria-label="Your projects">
              {field.projects.map((p) => (
                <ProjectCard
                  key={p.id}
                  project={p}
                  status={field.cells[p.id]}
                  entries={field.entries}
                  onLog={() => {
                    setSaved(undefined);
                    setLogging(p.id);
                  }}
                />
              ))}
            </ul>
          ) : progress.running || (online && field.lastSync === null && progress.problems.length === 0) ? (
            <LoadingPanel what="your projects" />
          ) : !online ? (
            <OfflinePanel>Your projects appear here after this device’s first sync with the network.</OfflinePanel>
          ) : (
            <EmptyPanel title="No projects for you yet">
              <p>Projects your supervisor assigns to you appear here.</p>
              {progress.problems.map((p) => (
                <p key={p} className="pl-muted">
                  {p}
                </p>
              ))}
            </EmptyPanel>
          )}
        </>
      )}
    </PageFrame>
  );
}
