import { Fragment, useState } from 'react';
import { CircleCheck, CircleX, Hourglass, type LucideIcon } from 'lucide-react';
import type { OutboxDto } from '../../../../shared/schemas/api';
import { Button } from '../../../components/ui/button';
import { ScrollBox } from '../../../components/ui/scroll-box';
import { formatDateTime } from '../../../lib/format';
import { ColumnHeads } from '../../../components/ui/column-heads';

const STATUS: Record<OutboxDto['status'], { word: string; Icon: LucideIcon; tone: string }> = {
  pending: { word: 'waiting to send', Icon: Hourglass, tone: 'text-concrete-700' },
  sent: { word: 'sent', Icon: CircleCheck, tone: 'text-concrete-800 [&_svg]:text-util-calm' },
  failed: { word: 'failed', Icon: CircleX, tone: 'text-util-over' },
};

/** The captured e-mails, newest first; each one's text opens below its row. */
export function OutboxTable({ mails }: { mails: OutboxDto[] }) {
  const [open, setOpen] = useState<number | null>(null);
  if (mails.length === 0) return <p className="text-sm text-concrete-700">No e-mails have been sent yet.</p>;
  return (
    <ScrollBox label="E-mails">
      <table className="w-full border-collapse text-sm">
        <caption className="sr-only">E-mails captured, newest first</caption>
        <ColumnHeads
          names={[
            'Time',
            'To',
            'Subject',
            'Status',
            'Attempts',
            'Last error',
            <span className="sr-only">Text</span>,
          ]}
        />
        <tbody>
          {mails.map((mail) => {
            const { word, Icon, tone } = STATUS[mail.status];
            const textId = `mail-text-${mail.id}`;
            return (
              <Fragment key={mail.id}>
                <tr className="border-b border-concrete-100 align-top" data-mail={mail.id}>
                  <td className="py-1 pr-3 whitespace-nowrap text-concrete-700">
                    <time dateTime={mail.createdAt}>{formatDateTime(mail.createdAt)}</time>
                  </td>
                  <td className="py-1 pr-3 text-concrete-900">{mail.to.join(', ')}</td>
                  <th scope="row" className="py-1 pr-3 text-left font-medium text-concrete-900">
                    {mail.subject}
                  </th>
                  <td className={`py-1 pr-3 ${tone}`}>
                    <span className="inline-flex items-center gap-1">
                      <Icon aria-hidden="true" className="h-4 w-4" />
                      {word}
                    </span>
                  </td>
                  <td className="py-1 pr-3 font-mono tabular-nums">{mail.attempts}</td>
                  <td className="py-1 pr-3 text-concrete-700">{mail.lastError ?? '—'}</td>
                  <td className="py-1">
                    <Button
                      size="sm"
                      className="whitespace-nowrap"
                      aria-expanded={open === mail.id}
                      aria-controls={textId}
                      aria-label={`${open === mail.id ? 'Hide' : 'Show'} text of “${mail.subject}”`}
                      onClick={() => setOpen(open === mail.id ? null : mail.id)}
                    >
                      {open === mail.id ? 'Hide text' : 'Show text'}
                    </Button>
                  </td>
                </tr>
                {open === mail.id && (
                  <tr id={textId}>
                    <td colSpan={7} className="bg-concrete-50 p-3">
                      <pre className="whitespace-pre-wrap font-mono text-xs text-concrete-900">
                        {mail.text}
                      </pre>
                    </td>
                  </tr>
                )}
              </Fragment>
            );
          })}
        </tbody>
      </table>
    </ScrollBox>
  );
}
