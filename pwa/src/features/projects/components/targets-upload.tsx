import { useId, useState } from 'react';
import type { Targets } from '../api/get-targets';
import { useParseTargets } from '../api/parse-targets';

interface TargetsUploadProps {
  projectId: string;
  /** The file's targets, for review in the form; nothing is saved here. */
  onRead: (targets: Targets, fileName: string) => void;
}

/** Reads a `variable,category,share` CSV on the server and hands the result back for review. */
export function TargetsUpload({ projectId, onRead }: TargetsUploadProps) {
  const inputId = useId();
  const parse = useParseTargets(projectId);
  const [file, setFile] = useState<File | null>(null);

  const read = () => {
    if (!file) return;
    parse.mutate(file, { onSuccess: (targets) => onRead(targets, file.name) });
  };

  return (
    <div className="pl-upload">
      <label htmlFor={inputId} className="pl-upload-label">
        Targets file (CSV: variable,category,share)
      </label>
      <div className="pl-upload-row">
        <input
          id={inputId}
          type="file"
          accept=".csv,text/csv,text/plain"
          onChange={(event) => {
            parse.reset();
            setFile(event.target.files?.[0] ?? null);
          }}
        />
        <button type="button" className="pl-button pl-button-quiet pl-button-small" onClick={read} disabled={!file || parse.isPending}>
          {parse.isPending ? 'Reading…' : 'Read file'}
        </button>
      </div>
      <p className="pl-small pl-muted">Comma or semicolon separated, UTF-8, at most 256 KB. Reading a file saves nothing.</p>
      {parse.error ? (
        <div className="pl-form-problem" role="alert">
          <p>The file was not read, and nothing changed:</p>
          <p className="pl-upload-error">{parse.error.message}</p>
        </div>
      ) : null}
    </div>
  );
}
