import { Dialog } from '../ui/dialog';
import { ShapesBrowser, type ShapeAction } from './shapes-browser';

/** The shapes browser as a picker, opened from the desk. */
export function ShapePickerDialog({
  open,
  onClose,
  actions,
  initial,
  projectId,
}: {
  open: boolean;
  onClose: () => void;
  actions: ShapeAction[];
  initial?: string | null;
  projectId?: number;
}) {
  return (
    <Dialog open={open} title="Pick a shape" onClose={onClose} wide>
      <ShapesBrowser actions={actions} initial={initial ?? null} projectId={projectId} />
    </Dialog>
  );
}
