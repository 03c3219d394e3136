import { commandOf, type Dispatch } from '../commands/command-registry.ts';

const toolButton =
  'inline-flex min-h-11 items-center gap-2 rounded-full border border-linen-300 bg-white px-4 text-sm font-medium hover:bg-linen-100 disabled:opacity-45';

/** Undo, redo and remove, above the canvas; the keys are shown so people can learn them. */
export function DesignerToolbar({
  canUndo,
  canRedo,
  hasSelection,
  dispatch,
}: {
  canUndo: boolean;
  canRedo: boolean;
  hasSelection: boolean;
  dispatch: Dispatch;
}) {
  return (
    <div role="toolbar" aria-label="Design tools" className="flex flex-wrap items-center gap-2">
      <button
        type="button"
        className={toolButton}
        disabled={!canUndo}
        onClick={() => dispatch('undo', undefined)}
        aria-keyshortcuts="Control+Z Meta+Z"
      >
        <span aria-hidden="true">↶</span> {commandOf('undo').label}
      </button>
      <button
        type="button"
        className={toolButton}
        disabled={!canRedo}
        onClick={() => dispatch('redo', undefined)}
        aria-keyshortcuts="Control+Shift+Z Meta+Shift+Z Control+Y"
      >
        <span aria-hidden="true">↷</span> {commandOf('redo').label}
      </button>
      <button
        type="button"
        className={toolButton}
        disabled={!hasSelection}
        onClick={() => dispatch('remove-placement', {})}
        aria-keyshortcuts="Delete Backspace"
      >
        {commandOf('remove-placement').label} selected
      </button>
    </div>
  );
}
