import { useState } from 'react';
import { QueryView } from '../../../components/query-view';
import { heading, WORDS } from '../../../lib/glossary';
import type { Project } from '../../../lib/projects/get-projects';
import { useTargets, type SavedTargets, type Targets } from '../api/get-targets';
import { useSaveTargets } from '../api/save-targets';
import { usePreviewTargets } from '../api/preview-targets';
import { useCells } from '../api/get-cells';
import type { CellResponse } from '../../../lib/api-types';
import { CellPreviewDialog } from './cell-preview-dialog';
import { CellTargets } from './cell-targets';
import { blankVariable, checkDraftTargets, draftFrom, offTotals, type DraftVariable } from './targets-draft';
import { RemoveVariableDialog } from './remove-variable-dialog';
import { ScaleSharesDialog } from './scale-shares-dialog';
import { JointSharesNote, type HeldJoint } from './joint-shares-note';
import { TargetsUpload } from './targets-upload';
import { VariableEditor } from './variable-editor';

/** Quota targets: typed in or read from a file, reviewed, then saved as a whole. */
export function TargetsSection({ project }: { project: Project }) {
  const targets = useTargets(project.id);
  return (
    <QueryView query={targets} what="quota targets" offlineNote="The quota targets need the network." isEmpty={() => false} empty={null}>
      {(saved) => <TargetsEditor project={project} saved={saved} />}
    </QueryView>
  );
}

/** The joint shares targets carry, tied to the interlocked variables they were given for. */
function heldJoint(targets: Targets, source: string): HeldJoint | null {
  if (!targets.jointShares || targets.jointShares.length === 0) return null;
  return { variables: targets.variables.filter((v) => v.interlocked).map((v) => v.name), shares: targets.jointShares, source };
}

function TargetsEditor({ project, saved }: { project: Project; saved: SavedTargets }) {
  const save = useSaveTargets(project.id);
  const preview = usePreviewTargets(project.id);
  const current = useCells(project.id);
  const [checking, setChecking] = useState<{ targets: Targets; cells: CellResponse[] } | null>(null);
  const [draft, setDraft] = useState<DraftVariable[]>(() => (saved.variables.length ? draftFrom(saved) : [blankVariable()]));
  const [fromFile, setFromFile] = useState<string | null>(null);
  const [problems, setProblems] = useState<string[]>([]);
  const [savedNote, setSavedNote] = useState(false);
  const [joint, setJoint] = useState<HeldJoint | null>(() => heldJoint(saved, 'saved'));
  const [scaling, setScaling] = useState<{ name: string; total: number }[] | null>(null);
  const [removing, setRemoving] = useState<DraftVariable | null>(null);
  const interlocked = draft.filter((v) => v.interlocked).map((v) => v.name.trim() || 'unnamed');
  // Interviews each saved variable and category holds, to say so before one is removed.
  const counts = new Map(saved.variables.flatMap((v) => [[v.id, v.interviews] as const, ...v.categories.map((c) => [c.id, c.interviews] as const)]));
  const held = (id: string | undefined) => (id ? (counts.get(id) ?? 0) : 0);
  const inField = project.status !== 'setup';

  const change = (next: DraftVariable[]) => {
    setDraft(next);
    setSavedNote(false);
    preview.reset();
  };
  const submit = (scaleConfirmed = false) => {
    setScaling(null);
    const checked = checkDraftTargets(draft);
    if (joint && joint.variables.join('\u0000') !== interlocked.join('\u0000')) {
      checked.problems.push(
        `The joint shares are for ${joint.variables.join(' × ')}: interlock exactly those, or use the product of the margins instead.`,
      );
    }
    setProblems(checked.problems);
    if (!checked.targets || checked.problems.length > 0) return;
    const off = offTotals(draft);
    if (off.length > 0 && !scaleConfirmed) {
      setScaling(off);
      return;
    }
    const targets = joint ? { ...checked.targets, jointShares: joint.shares } : checked.targets;
    // Every cell target is shown before anything is saved.
    preview.mutate(targets, { onSuccess: ({ cells }) => setChecking({ targets, cells }) });
  };
  const confirmSave = (targets: Targets) =>
    save.mutate(targets, {
      onSuccess: () => {
        setChecking(null);
        setFromFile(null);
        setSavedNote(true);
      },
    });

  return (
    <>
      {project.status !== 'setup' ? (
        <p className="pl-form-note">
          Fieldwork has started. Saving new targets recomputes the cells; every interview already logged is kept.
        </p>
      ) : null}
      <TargetsUpload
        projectId={project.id}
        onRead={(targets, name) => {
          change(draftFrom(targets));
          setJoint(heldJoint(targets, name));
          setFromFile(name);
        }}
      />
      {fromFile ? (
        <p className="pl-form-note" role="status">
          Read from {fromFile}: {draft.length === 1 ? '1 variable' : `${draft.length} variables`}. Nothing is saved yet: check the figures below, tick the variables
          to interlock, then save.
        </p>
      ) : null}
      <div className="pl-variables">
        {draft.map((variable, index) => (
          <VariableEditor
            key={variable.key}
            variable={variable}
            position={index + 1}
            onChange={(next) => change(draft.map((v) => (v.key === variable.key ? next : v)))}
            held={held}
            inField={inField}
            onRemove={() =>
              variable.id && (inField || held(variable.id) > 0) ? setRemoving(variable) : change(draft.filter((v) => v.key !== variable.key))
            }
          />
        ))}
      </div>
      <JointSharesNote
        interlocked={interlocked}
        joint={joint}
        onDrop={() => {
          setJoint(null);
          setSavedNote(false);
        }}
      />
      <p className="pl-small">
        {interlocked.length >= 2
          ? `${heading(WORDS.interlockedSet.one)}: ${interlocked.join(' × ')}; every other variable is a ${WORDS.margin.one}.`
          : `No ${WORDS.interlockedSet.one}: every variable is a ${WORDS.margin.one}.`}
      </p>
      {problems.length > 0 || preview.error ? (
        <div className="pl-form-problem" role="alert">
          <p>Not saved:</p>
          <ul>
            {problems.map((problem) => (
              <li key={problem}>{problem}</li>
            ))}
            {preview.error ? <li>{preview.error.message}</li> : null}
          </ul>
        </div>
      ) : null}
      <div className="pl-form-actions">
        <button type="button" className="pl-button pl-button-quiet" onClick={() => change([...draft, blankVariable()])}>
          Add a variable
        </button>
        <button type="button" className="pl-button pl-button-main" onClick={() => submit()} disabled={preview.isPending || save.isPending}>
          {preview.isPending ? 'Working out the cells…' : 'Save targets'}
        </button>
      </div>
      {removing ? (
        <RemoveVariableDialog
          what="variable"
          name={removing.name.trim() || 'this variable'}
          interviews={held(removing.id)}
          onConfirm={() => {
            change(draft.filter((v) => v.key !== removing.key));
            setRemoving(null);
          }}
          onCancel={() => setRemoving(null)}
        />
      ) : null}
      {checking ? (
        <CellPreviewDialog
          cells={checking.cells}
          current={current.data?.cells ?? []}
          sampleSize={project.targetSize}
          busy={save.isPending}
          problem={save.error?.message ?? null}
          onConfirm={() => confirmSave(checking.targets)}
          onCancel={() => {
            setChecking(null);
            save.reset();
          }}
        />
      ) : null}
      {scaling ? <ScaleSharesDialog totals={scaling} onConfirm={() => submit(true)} onCancel={() => setScaling(null)} /> : null}
      {savedNote ? (
        <p className="pl-saved" role="status">
          Targets saved; the cell targets below are recomputed.
        </p>
      ) : null}
      <h3 className="pl-subsection-title">Cell targets</h3>
      <CellTargets projectId={project.id} />
    </>
  );
}
