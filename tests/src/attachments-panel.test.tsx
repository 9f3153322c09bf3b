import { describe, expect, it, vi } from 'vitest';
import { act, render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { AttachmentsPanel } from '../../src/features/attachments/components/attachments-panel';
import type { AttachmentDto, RevisionSummaryDto, UserDto } from '../../shared/schemas/api';
import { stubFetch, users } from './history-fixtures';

const drawing: AttachmentDto = {
  id: 5,
  cantileverId: 7,
  originalName: 'plate-detail.pdf',
  mimeType: 'application/pdf',
  size: 245_760,
  sha256: 'ab12cd34ef567890aa',
  uploaderId: 3,
  uploaderName: 'Fern Fabricator',
  createdAt: '2026-11-02T10:00:00.000Z',
  description: '',
  revisionId: null,
  revisionNumber: null,
};
const photo: AttachmentDto = {
  ...drawing,
  id: 6,
  originalName: 'pier.jpg',
  mimeType: 'image/jpeg',
  size: 512,
};

interface Controls {
  sent: FormData[];
  /** Reports upload progress, then answers; the test decides when. */
  progress: (loaded: number, total: number) => void;
  finish: () => void;
}

/** A stand-in for XMLHttpRequest that the test drives step by step. */
function fakeXhr(reply: { status: number; body: unknown }, controls: Controls) {
  return class FakeXhr {
    status = 0;
    responseText = '';
    withCredentials = false;
    upload: {
      onprogress: ((e: { lengthComputable: boolean; loaded: number; total: number }) => void) | null;
    } = { onprogress: null };
    onload: (() => void) | null = null;
    onerror: (() => void) | null = null;
    open(method: string, url: string) {
      expect([method, url]).toEqual(['POST', '/api/cantilevers/7/attachments']);
    }
    setRequestHeader() {}
    send(form: FormData) {
      controls.sent.push(form);
      controls.progress = (loaded, total) =>
        act(() => this.upload.onprogress?.({ lengthComputable: true, loaded, total }));
      controls.finish = () =>
        act(() => {
          this.status = reply.status;
          this.responseText = JSON.stringify(reply.body);
          this.onload?.();
        });
    }
  };
}

const summary = (id: number, number: number, message: string): RevisionSummaryDto => ({
  id,
  cantileverId: 7,
  number,
  authorId: users.architect.id,
  authorName: users.architect.displayName,
  message,
  engineVersion: '2.0.0',
  baseRevisionNumber: number > 1 ? number - 1 : null,
  createdAt: `2026-11-0${number}T10:00:00.000Z`,
  ok: true,
  reviewState: 'draft',
});
const revisionsOf7 = [summary(12, 2, 'Deeper tip'), summary(11, 1, 'First design')];

function setup(
  me: UserDto,
  list: AttachmentDto[],
  more?: (call: { method: string; path: string }) => object | undefined,
) {
  const calls = stubFetch((call) =>
    call.path === '/api/auth/me'
      ? { body: me }
      : call.path === '/api/cantilevers/7/attachments'
        ? { body: list }
        : call.path === '/api/cantilevers/7/revisions'
          ? { body: revisionsOf7 }
          : more?.(call),
  );
  const client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  render(
    <QueryClientProvider client={client}>
      <AttachmentsPanel cantileverId={7} />
    </QueryClientProvider>,
  );
  return calls;
}

describe('AttachmentsPanel', () => {
  it('lists files with type, size, uploader and a short checksum, with preview and download links', async () => {
    setup(users.architect, [drawing, photo]);
    expect(await screen.findByText('plate-detail.pdf')).toBeInTheDocument();
    expect(screen.getByText(/PDF · 240\.0 KiB · Fern Fabricator/)).toBeInTheDocument();
    expect(screen.getAllByText('sha256 ab12cd34ef')).toHaveLength(2);
    expect(screen.getByRole('link', { name: 'Open plate-detail.pdf in a new tab' })).toHaveAttribute(
      'href',
      '/api/attachments/5?inline=1',
    );
    expect(screen.getByRole('link', { name: 'Download pier.jpg' })).toHaveAttribute(
      'href',
      '/api/attachments/6',
    );
    expect(screen.getByRole('img', { name: 'Preview of pier.jpg' })).toHaveAttribute(
      'src',
      '/api/attachments/6?inline=1',
    );
  });

  it('uploads with a progress bar and says in words when the server refuses a file as too large', async () => {
    const user = userEvent.setup();
    const controls: Controls = { sent: [], progress: () => undefined, finish: () => undefined };
    vi.stubGlobal(
      'XMLHttpRequest',
      fakeXhr(
        {
          status: 413,
          body: {
            error: { code: 'too_large', message: 'The file is larger than the limit of 10 MiB.', issues: [] },
          },
        },
        controls,
      ),
    );
    setup(users.architect, []);
    const input = await screen.findByLabelText(/Add a file/);
    const file = new File(['x'.repeat(100)], 'big-drawing.pdf', { type: 'application/pdf' });
    await user.upload(input, file);
    await user.click(screen.getByRole('button', { name: 'Upload' }));
    const bar = await screen.findByRole('progressbar', { name: 'Upload progress' });
    expect(screen.getByText('0 %')).toBeInTheDocument();
    controls.progress(60, 100);
    expect(bar).toHaveAttribute('value', '0.6');
    expect(screen.getByText('60 %')).toBeInTheDocument();
    controls.finish();
    expect(
      await screen.findByText('The file is too large. The file is larger than the limit of 10 MiB.'),
    ).toBeInTheDocument();
    expect(screen.queryByRole('progressbar')).not.toBeInTheDocument();
    expect((controls.sent[0].get('file') as File).name).toBe('big-drawing.pdf');
  });

  it('warns before uploading a file of a type the server refuses, and reports the 400 in words', async () => {
    const user = userEvent.setup({ applyAccept: false });
    const controls: Controls = { sent: [], progress: () => undefined, finish: () => undefined };
    vi.stubGlobal(
      'XMLHttpRequest',
      fakeXhr(
        {
          status: 400,
          body: {
            error: {
              code: 'bad_request',
              message: 'The file was refused: not an allowed type.',
              issues: [{ path: 'file', message: 'not an allowed type' }],
            },
          },
        },
        controls,
      ),
    );
    setup(users.architect, []);
    await user.upload(
      await screen.findByLabelText(/Add a file/),
      new File(['MZ'], 'tool.exe', { type: 'application/octet-stream' }),
    );
    expect(
      screen.getByText(/“tool\.exe” does not look like a PDF, PNG, JPEG, DXF or CSV file/),
    ).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Upload' }));
    controls.finish();
    expect(
      await screen.findByText(/This file is not allowed\. The file was refused: not an allowed type\./),
    ).toBeInTheDocument();
  });

  it('uploads a file and shows it in the list once the server has stored it', async () => {
    const user = userEvent.setup();
    const controls: Controls = { sent: [], progress: () => undefined, finish: () => undefined };
    vi.stubGlobal('XMLHttpRequest', fakeXhr({ status: 201, body: drawing }, controls));
    const stored: AttachmentDto[] = [];
    stubFetch(({ path }) =>
      path === '/api/auth/me'
        ? { body: users.architect }
        : path === '/api/cantilevers/7/attachments'
          ? { body: stored }
          : path === '/api/cantilevers/7/revisions'
            ? { body: revisionsOf7 }
            : undefined,
    );
    const client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
    render(
      <QueryClientProvider client={client}>
        <AttachmentsPanel cantileverId={7} />
      </QueryClientProvider>,
    );
    expect(await screen.findByText('No files yet.')).toBeInTheDocument();
    await user.upload(
      screen.getByLabelText(/Add a file/),
      new File(['%PDF-1.7'], 'plate-detail.pdf', { type: 'application/pdf' }),
    );
    await user.type(screen.getByLabelText('Description (optional)'), 'Base plate, sheet 2');
    await screen.findByRole('option', { name: 'revision 2: Deeper tip' });
    await user.selectOptions(screen.getByLabelText('Belongs to'), 'revision 2: Deeper tip');
    await user.click(screen.getByRole('button', { name: 'Upload' }));
    expect(controls.sent[0].get('description')).toBe('Base plate, sheet 2');
    expect(controls.sent[0].get('revisionId')).toBe(String(revisionsOf7[0].id));
    stored.push(drawing);
    controls.finish();
    expect(await screen.findByText('Uploaded “plate-detail.pdf”.')).toBeInTheDocument();
    expect(await screen.findByRole('link', { name: 'Download plate-detail.pdf' })).toBeInTheDocument();
  });

  it('shows the description and the revision a file belongs to', async () => {
    setup(users.architect, [
      { ...drawing, description: 'Base plate, sheet 2', revisionId: 12, revisionNumber: 2 },
    ]);
    expect(await screen.findByText('Base plate, sheet 2')).toBeInTheDocument();
    expect(screen.getByText('revision 2')).toBeInTheDocument();
  });

  it('offers neither delete nor describe to a member who did not upload the file', async () => {
    setup(users.engineer, [drawing]);
    await screen.findByText('plate-detail.pdf');
    expect(screen.queryByRole('button', { name: /Delete/ })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /Edit the description/ })).not.toBeInTheDocument();
  });

  it('deletes a file only after the confirmation, and says so', async () => {
    const user = userEvent.setup();
    const mine = { ...drawing, uploaderId: users.architect.id };
    let listed: AttachmentDto[] = [mine];
    const calls = stubFetch((call) =>
      call.path === '/api/auth/me'
        ? { body: users.architect }
        : call.path === '/api/cantilevers/7/attachments'
          ? { body: listed }
          : call.path === '/api/cantilevers/7/revisions'
            ? { body: revisionsOf7 }
            : call.method === 'DELETE' && call.path === '/api/attachments/5'
              ? ((listed = []), { status: 204 })
              : undefined,
    );
    const client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
    render(
      <QueryClientProvider client={client}>
        <AttachmentsPanel cantileverId={7} />
      </QueryClientProvider>,
    );
    await user.click(await screen.findByRole('button', { name: 'Delete plate-detail.pdf' }));
    const dialog = screen.getByRole('dialog', { name: 'Delete this file?' });
    expect(dialog).toHaveTextContent('“plate-detail.pdf” and its record are removed for everyone');
    await user.click(screen.getByRole('button', { name: 'Keep the file' }));
    expect(calls.some((c) => c.method === 'DELETE')).toBe(false);
    await user.click(screen.getByRole('button', { name: 'Delete plate-detail.pdf' }));
    await user.click(screen.getByRole('button', { name: 'Delete the file' }));
    expect(await screen.findByText('Deleted “plate-detail.pdf”.')).toBeInTheDocument();
    expect(calls.filter((c) => c.method === 'DELETE').map((c) => c.path)).toEqual(['/api/attachments/5']);
    expect(await screen.findByText('No files yet.')).toBeInTheDocument();
  });

  it('lets the uploader edit the description', async () => {
    const user = userEvent.setup();
    const mine = { ...drawing, uploaderId: users.architect.id, description: 'old words' };
    const calls = setup(users.architect, [mine], (call) =>
      call.method === 'PATCH' && call.path === '/api/attachments/5'
        ? { body: { ...mine, description: 'Pier elevation' } }
        : undefined,
    );
    await user.click(await screen.findByRole('button', { name: 'Edit the description of plate-detail.pdf' }));
    const field = screen.getByLabelText('Description of plate-detail.pdf');
    await user.clear(field);
    await user.type(field, 'Pier elevation');
    await user.click(screen.getByRole('button', { name: 'Save' }));
    expect(await screen.findByText('The description of “plate-detail.pdf” was saved.')).toBeInTheDocument();
    expect(calls.find((c) => c.method === 'PATCH')?.body).toEqual({ description: 'Pier elevation' });
  });

  it('offers no upload to an admin', async () => {
    setup(users.admin, [drawing]);
    expect(
      await screen.findByText('Your role (admin) may look at files but not add them.'),
    ).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Upload' })).not.toBeInTheDocument();
    // An admin may delete any file, but not describe another's.
    expect(screen.getByRole('button', { name: 'Delete plate-detail.pdf' })).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /Edit the description/ })).not.toBeInTheDocument();
  });
});
