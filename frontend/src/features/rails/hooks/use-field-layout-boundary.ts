import { useLayoutEffect, useRef } from 'react';

/**
 * A text field laid out on its own while its height cannot change. Typing changes the text inside
 * an input, and the browser lays out again from there up to the nearest box whose size cannot
 * depend on its content: in a table that is the whole page, every cell and every field with it
 * (on a slow tablet, more than the keystroke itself). A field with a fixed height and size and
 * layout containment is such a box, so a keystroke lays out that field alone and no other field
 * is painted again.
 *
 * The height is the input line's own, as laid out (it differs on touch screens), and it is only
 * held while `sealed`: a field showing a message below it grows, so it is laid out with the rest.
 * Put `field` on the field's root and `line` on its input line (TextField: `ref` and
 * `slotProps.input.ref`).
 */
export function useFieldLayoutBoundary(sealed: boolean) {
  const field = useRef<HTMLDivElement | null>(null);
  const line = useRef<HTMLDivElement | null>(null);
  useLayoutEffect(() => {
    const box = field.current;
    const input = line.current;
    if (!sealed || !box || !input || typeof ResizeObserver === 'undefined') return;
    // Told after layout, with no layout forced: the fields of a whole table are sealed at once.
    const observer = new ResizeObserver(([entry]) => {
      const height = entry?.borderBoxSize?.[0]?.blockSize;
      if (!height) return;
      box.style.height = `${height}px`;
      box.style.contain = 'size layout';
    });
    observer.observe(input);
    return () => {
      observer.disconnect();
      box.style.height = '';
      box.style.contain = '';
    };
  }, [sealed]);
  return { field, line };
}
