import { useId, useState } from 'react';
import type { Targets } from '../api/get-targets';
import { useParseTargets } from '../api/parse-targets';

interface TargetsUploadProps {
  projectId: string;
  /** The file's targets, for review in the form; nothing is saved here. */
  onRead: (targets: Targets, fileName: string) => void;
}

/** The server's limit on a targets file (api/src/quotas/quotas.controller.ts), checked here before sending. */
const TARGETS_FILE_LIMIT = 256 * 1024;

function formatFileSize(bytes: number): string {
  return bytes >= 1024 * 1024 ? `${(bytes / (1024 * 1024)).toFixed(1)} MB` : `${Math.ceil(bytes / 1024)} KB`;
}

/** Reads a `variable,category,share` CSV on the server and hands the result back for review. */
export function TargetsUpload({ projectId, onRead }: TargetsUploadProps) {
  const inputId = useId();
  const parse = useParseTargets(projectId);
  const [file, setFile] = useState<File | null>(null);
  const tooLarge = file !== null && file.size > TARGETS_FILE_LIMIT;

  const read = () => {
    if (!file || tooLarge) return;
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
        <button type="button" className="pl-button pl-button-quiet pl-button-small" onClick={read} disabled={!file || tooLarge || parse.isPending}>
          {parse.isPending ? 'Reading…' : 'Read file'}
        </button>
      </div>
      <p className="pl-small pl-muted">Comma or semicolon separated, UTF-8, at most 256 KB. Reading a file saves nothing.</p>
      {tooLarge ? (
        <div className="pl-form-problem" role="alert">
          <p>
            {file.name} is {formatFileSize(file.size)}; a targets file may be at most {formatFileSize(TARGETS_FILE_LIMIT)}. Nothing was
            sent.
          </p>
        </div>
      ) : null}
      {parse.error ? (
        <div className="pl-form-problem" role="alert">
          <p>The file was not read, and nothing changed:</p>
          <p className="pl-upload-error">{parse.error.message}</p>
        </div>
      ) : null}
    </div>
  );
}
