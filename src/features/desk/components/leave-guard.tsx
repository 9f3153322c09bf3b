import { useEffect } from 'react';
import { useBlocker } from 'react-router-dom';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { readStudyStart } from '../../../lib/study-handoff';

/** Stops a move away (in the app or by closing the tab) while there is unsaved work. */
export function LeaveGuard({ dirty }: { dirty: boolean }) {
  const blocker = useBlocker(
    // The reach study takes the unsaved document with it (and hands points back as unsaved changes).
    ({ currentLocation, nextLocation }) =>
      dirty && currentLocation.pathname !== nextLocation.pathname && !readStudyStart(nextLocation.state),
  );

  useEffect(() => {
    if (!dirty) return;
    function onBeforeUnload(event: BeforeUnloadEvent) {
      event.preventDefault();
      event.returnValue = '';
    }
    window.addEventListener('beforeunload', onBeforeUnload);
    return () => window.removeEventListener('beforeunload', onBeforeUnload);
  }, [dirty]);

  return (
    <Dialog
      open={blocker.state === 'blocked'}
      title="Leave without saving?"
      onClose={() => blocker.reset?.()}
    >
      <p className="text-sm">
        This design has changes that are not saved as a revision. If you leave, they are lost.
      </p>
      <div className="mt-4 flex justify-end gap-2">
        <Button variant="primary" onClick={() => blocker.reset?.()}>
          Stay on the desk
        </Button>
        <Button variant="danger" onClick={() => blocker.proceed?.()}>
          Leave and lose the changes
        </Button>
      </div>
    </Dialog>
  );
}
