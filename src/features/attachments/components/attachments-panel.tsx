/** Placeholder until the attachments feature lands: the cantilever's drawings and photos. */
export function AttachmentsPanel({ cantileverId }: { cantileverId: number }) {
  return <p className="text-sm text-concrete-600" data-cantilever={cantileverId}>Attachments are not available yet.</p>;
}
