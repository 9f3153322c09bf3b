import { Download, Eye } from 'lucide-react';
import type { AttachmentDto } from '../../../../shared/schemas/api';
import { attachmentUrl } from '../api/get-attachments';
import { formatBytes } from '../utils/upload-messages';
import { formatDate } from '../../../lib/format';

const TYPE_WORDS: Record<string, string> = {
  'application/pdf': 'PDF',
  'image/png': 'PNG image',
  'image/jpeg': 'JPEG image',
  'image/vnd.dxf': 'DXF drawing',
  'text/csv': 'CSV table',
};

const isImage = (a: AttachmentDto) => a.mimeType === 'image/png' || a.mimeType === 'image/jpeg';

/** The cantilever's files: name, type, size, uploader, date and a short checksum; preview and download. */
export function AttachmentsList({ attachments }: { attachments: AttachmentDto[] }) {
  if (attachments.length === 0) return <p className="text-sm text-concrete-600">No files yet.</p>;
  return (
    <ul className="divide-y divide-concrete-100">
      {attachments.map((a) => (
        <li key={a.id} className="flex flex-wrap items-center gap-3 py-2 text-sm">
          {isImage(a) && (
            <img
              src={attachmentUrl(a.id, true)}
              alt={`Preview of ${a.originalName}`}
              loading="lazy"
              className="h-12 w-16 rounded border border-concrete-200 object-cover"
            />
          )}
          <div className="min-w-0 flex-1">
            <p className="truncate font-medium text-concrete-900">{a.originalName}</p>
            <p className="text-xs text-concrete-600">
              {TYPE_WORDS[a.mimeType] ?? a.mimeType} · {formatBytes(a.size)} · {a.uploaderName} ·{' '}
              <time dateTime={a.createdAt}>{formatDate(a.createdAt)}</time> ·{' '}
              <abbr title={`SHA-256 ${a.sha256}`} className="font-mono no-underline">
                sha256 {a.sha256.slice(0, 10)}
              </abbr>
            </p>
          </div>
          {(a.mimeType === 'application/pdf' || isImage(a)) && (
            <a
              href={attachmentUrl(a.id, true)}
              target="_blank"
              rel="noopener noreferrer"
              aria-label={`Open ${a.originalName} in a new tab`}
              className="inline-flex items-center gap-1 text-oxide-700 underline"
            >
              <Eye aria-hidden="true" className="h-4 w-4" />
              Open
            </a>
          )}
          <a
            href={attachmentUrl(a.id)}
            download={a.originalName}
            aria-label={`Download ${a.originalName}`}
            className="inline-flex items-center gap-1 text-oxide-700 underline"
          >
            <Download aria-hidden="true" className="h-4 w-4" />
            Download
          </a>
        </li>
      ))}
    </ul>
  );
}
