import type { JointShare } from '../api/get-targets';

/** The joint table the editor holds: the interlocked variables it was given for, and its shares. */
export interface HeldJoint {
  variables: string[];
  shares: JointShare[];
  /** Where it came from, in words: "saved" or the file's name. */
  source: string;
}

interface JointSharesNoteProps {
  interlocked: string[];
  joint: HeldJoint | null;
  onDrop: () => void;
}

/**
 * Says where the interlocked cells' targets come from: the joint shares a census table gives,
 * or the product of the margins (independence, which age and sex, for one, do not have).
 */
export function JointSharesNote({ interlocked, joint, onDrop }: JointSharesNoteProps) {
  if (joint) {
    return (
      <div className="pl-form-note" role="note" aria-label="Cell targets of interlocked variables">
        <p>
          Cell targets for {joint.variables.join(' × ')} come from their joint shares ({joint.shares.length} combinations,{' '}
          {joint.source === 'saved' ? 'saved with the targets' : `read from ${joint.source}`}); the margins of these variables
          are summed from that table, and weighting rakes to the crossed cells.
        </p>
        <button type="button" className="pl-button pl-button-quiet pl-button-small" onClick={onDrop}>
          Use the product of the margins instead
        </button>
      </div>
    );
  }
  if (interlocked.length < 2) return null;
  return (
    <p className="pl-form-note" role="note" aria-label="Cell targets of interlocked variables">
      Cell targets for {interlocked.join(' × ')} are the product of their margins, as if these variables were independent in
      the population; they rarely are (age and sex, for one). Weighting rakes to the margins only. A targets file with joint
      rows such as <code>age band × sex,18-24 × female,5.4</code> gives the cells their census shares.
    </p>
  );
}
