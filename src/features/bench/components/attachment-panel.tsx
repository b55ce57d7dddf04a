import { useRef, useState } from 'react';
import type { AttachmentView } from '@shared/views/observation';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { ErrorState, Loading } from '@/components/ui/states';
import { ApiError } from '@/lib/api-client';
import { attachmentUrl, showsInline } from '../api/attachment-url';
import { useObservation } from '../api/get-observation';
import { useUploadAttachments } from '../api/upload-attachments';
import { formatBytes } from './format-bytes';

const ACCEPT = '.png,.jpg,.jpeg,.tif,.tiff,.csv,.txt,image/png,image/jpeg,image/tiff,text/csv,text/plain';

/** Files of one saved observation: micrographs shown as thumbnails, instrument files as links. */
export function AttachmentPanel({ observationId }: { observationId: number }) {
  const observation = useObservation(observationId);
  const upload = useUploadAttachments(observationId);
  const input = useRef<HTMLInputElement>(null);
  const [files, setFiles] = useState<File[]>([]);
  const [message, setMessage] = useState<{ tone: 'success' | 'error'; text: string } | null>(null);

  const send = async () => {
    setMessage(null);
    try {
      const { attachments } = await upload.mutateAsync(files);
      setMessage({ tone: 'success', text: `Attached ${attachments.length} ${attachments.length === 1 ? 'file' : 'files'}.` });
      setFiles([]);
      if (input.current) input.current.value = '';
    } catch (error) {
      // The server names the refused file ("files.1: name.exe was refused: …"); the index means nothing here.
      setMessage({ tone: 'error', text: error instanceof ApiError ? error.message.replace(/^files(\.\d+)?: /, '') : 'The files were not attached. Try again.' });
    }
  };

  return (
    <section aria-labelledby={`files-${observationId}`} className="flex flex-col gap-3">
      <h3 id={`files-${observationId}`} className="text-base">
        Files for this observation
      </h3>
      <p className="text-sm text-ink-soft">Micrographs (PNG, JPEG, TIFF) or instrument exports (CSV, TXT). The type is checked from the file's content.</p>
      <div className="flex flex-wrap items-end gap-3">
        <Field label="Files to attach" className="min-w-72">
          {(props) => (
            <input
              {...props}
              ref={input}
              type="file"
              multiple
              accept={ACCEPT}
              onChange={(event) => setFiles(Array.from(event.target.files ?? []))}
              className="text-sm file:mr-3 file:rounded-md file:border file:border-line-strong file:bg-panel file:px-3 file:py-1.5 file:text-sm file:font-medium"
            />
          )}
        </Field>
        <Button variant="secondary" disabled={files.length === 0} busy={upload.isPending} onClick={send}>
          Attach {files.length > 1 ? `${files.length} files` : 'file'}
        </Button>
      </div>
      {message && <Notice tone={message.tone}>{message.text}</Notice>}
      {observation.isPending ? (
        <Loading label="Loading the files…" />
      ) : observation.isError ? (
        <ErrorState error={observation.error} retry={() => observation.refetch()} />
      ) : observation.data.attachments.length === 0 ? (
        <p className="text-sm text-ink-soft">No files attached yet.</p>
      ) : (
        <AttachmentList attachments={observation.data.attachments} />
      )}
    </section>
  );
}

function AttachmentList({ attachments }: { attachments: AttachmentView[] }) {
  return (
    <ul className="flex flex-wrap gap-3" aria-label="Attached files">
      {attachments.map((a) => (
        <li key={a.id} className="w-40 rounded-md border border-line bg-paper p-2 text-xs">
          {showsInline(a) ? (
            <a href={attachmentUrl(a)} download={a.originalName} className="block">
              <img src={attachmentUrl(a, true)} alt={`Micrograph ${a.originalName}`} className="h-28 w-full rounded object-cover" loading="lazy" />
              <span className="mt-1 block truncate">{a.originalName}</span>
            </a>
          ) : (
            <a href={attachmentUrl(a)} download={a.originalName} className="block truncate font-medium">
              {a.originalName}
            </a>
          )}
          <span className="text-ink-soft">
            {a.mimeType} · {formatBytes(a.sizeBytes)}
          </span>
        </li>
      ))}
    </ul>
  );
}
