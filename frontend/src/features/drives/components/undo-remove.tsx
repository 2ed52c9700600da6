import { useState } from 'react';
import { Button, Snackbar } from '@mui/material';

interface Removed {
  label: string;
  undo: () => void;
  at: number;
}

/**
 * A row taken out of an entry grid can be put back: "Removed move 3 — Undo" stays for a while
 * after each removal. Render `snackbar` once in the grid and call `removed` after taking a row out.
 */
export function useUndoRemove() {
  const [last, setLast] = useState<Removed | null>(null);
  const removed = (label: string, undo: () => void) => setLast({ label, undo, at: Date.now() });
  const snackbar = (
    <Snackbar
      key={last?.at}
      open={!!last}
      autoHideDuration={10_000}
      onClose={(_, reason) => reason !== 'clickaway' && setLast(null)}
      message={last ? `Removed ${last.label}` : ''}
      action={
        <Button
          color="inherit"
          size="small"
          sx={{ color: '#f3d9a4', minHeight: 44 }}
          onClick={() => {
            last?.undo();
            setLast(null);
          }}
        >
          Undo
        </Button>
      }
    />
  );
  return { removed, snackbar };
}

/** A remove button is reached with the mouse or a finger, never by Tab, and Enter never presses it. */
export const removeButtonProps = {
  tabIndex: -1,
  onKeyDown: (e: React.KeyboardEvent) => {
    if (e.key === 'Enter') e.preventDefault();
  },
} as const;
