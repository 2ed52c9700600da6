import { useCallback, useEffect, useLayoutEffect, useMemo, useRef, useState } from 'react';
import { UNIT_LABELS, type LengthUnit } from '../../lib/units';
import { KeyboardBurst } from './keyboard-burst';
import { parseReadingLine, readingInUnit, type LineFormat } from './parse-reading';
import { serialIndicator } from './serial-indicator';

/** Where a reading went, as the grid says it: "station 4 at 300 mm", and how to take it back. */
export interface Placed {
  /** The data-indicator-cell of the cell filled. */
  cell: string;
  label: string;
  undo: () => void;
}

/**
 * The grid's "next cell": put the reading (text in the grid's unit) in the cell whose
 * data-indicator-cell is `cell`, or in the next empty cell when `cell` is null. Null when no cell
 * is free.
 */
export type PlaceReading = (text: string, cell: string | null) => Placed | null;

export interface Arrival {
  text: string;
  unit: LengthUnit;
  /** What the indicator sent, when it was converted to the grid's unit. */
  sent: string | null;
  label: string | null;
  cell: string | null;
  /** Typed into a selected cell (rather than sent to the next empty one). */
  inCell: boolean;
  undo: (() => void) | null;
}

export interface IndicatorInput {
  /** Attach to the element that holds the grid's cells. */
  containerRef: (el: HTMLElement | null) => void;
  capture: boolean;
  setCapture: (on: boolean) => void;
  lineFormat: LineFormat;
  setLineFormat: (f: LineFormat) => void;
  last: Arrival | null;
  refused: string | null;
  undo: () => void;
}

const CAPTURE_KEY = 'railwright.indicator-capture';
const FORMAT_KEY = 'railwright.indicator-line-format';
// Fields a person types text into; a switch or button that has the focus does not count.
const NOT_TEXT = new Set(['checkbox', 'radio', 'button', 'submit', 'reset', 'range', 'color', 'file']);
const editable = (el: Element | null) =>
  !!el &&
  ((el instanceof HTMLInputElement && !NOT_TEXT.has(el.type)) ||
    el instanceof HTMLTextAreaElement ||
    el instanceof HTMLSelectElement ||
    (el as HTMLElement).isContentEditable);

/**
 * Readings from a digital indicator into a grid, from two sources. Keyboard: a reading closed by
 * Enter in one of the grid's cells lands in that cell, read by the common line format, and the
 * grid's own Enter then moves on (unless `enterMovesOn` is false: then only an indicator's fast
 * burst is taken, and its Enter held back); with capture on, a fast burst anywhere outside a text
 * field fills the next empty cell. Serial: each line from the connected port fills the next empty cell.
 */
export function useIndicatorInput({
  unit,
  place,
  enterMovesOn = true,
}: {
  unit: LengthUnit;
  place: PlaceReading;
  enterMovesOn?: boolean;
}): IndicatorInput {
  const [capture, setCaptureState] = useState(() => sessionStorage.getItem(CAPTURE_KEY) === 'on');
  const [lineFormat, setLineFormatState] = useState<LineFormat>(
    () => (localStorage.getItem(FORMAT_KEY) as LineFormat | null) ?? 'number',
  );
  const [last, setLast] = useState<Arrival | null>(null);
  const [refused, setRefused] = useState<string | null>(null);
  const container = useRef<HTMLElement | null>(null);
  // The latest props and state, read by the listeners without re-subscribing on every render.
  const live = useRef({ unit, place, enterMovesOn, capture, lineFormat });
  useLayoutEffect(() => {
    live.current = { unit, place, enterMovesOn, capture, lineFormat };
  });

  // Readings wait in a queue and are placed one per render, so each sees the cells the one before
  // it filled (a serial chunk often carries several lines at once).
  const queue = useRef<{ line: string; cell: string | null; format: LineFormat }[]>([]);
  const [, setQueued] = useState(0);
  const arrive = useCallback((line: string, cell: string | null, format: LineFormat) => {
    queue.current.push({ line, cell, format });
    setQueued((n) => n + 1);
  }, []);
  // After every render on purpose: one reading per render until the queue is empty (it only
  // shrinks here, so the chain of renders ends).
  // eslint-disable-next-line react-hooks/exhaustive-deps
  useEffect(() => {
    const next = queue.current.shift();
    if (!next) return;
    const parsed = parseReadingLine(next.line, next.format);
    if (!parsed.ok) {
      setRefused(`${parsed.message}. Nothing was filled.`);
      setQueued((n) => n + 1);
      return;
    }
    const { unit: gridUnit, place: put } = live.current;
    const text = readingInUnit(parsed, gridUnit);
    const placed = put(text, next.cell);
    setRefused(placed ? null : `Every cell already has a reading: ${text} ${UNIT_LABELS[gridUnit]} was not filled.`);
    setLast({
      text,
      unit: gridUnit,
      sent: parsed.unit && parsed.unit !== gridUnit ? next.line.trim() : null,
      label: placed?.label ?? null,
      cell: placed?.cell ?? null,
      inCell: next.cell !== null,
      undo: placed?.undo ?? null,
    });
  });

  useEffect(() => {
    const burst = new KeyboardBurst();
    const onKey = (e: KeyboardEvent) => {
      const text = burst.key(e.key, e.timeStamp);
      const target = e.target instanceof Element ? e.target : null;
      if (e.key !== 'Enter') {
        // Listening with no field selected: a space in a reading must not scroll the page.
        if (
          live.current.capture &&
          e.key.length === 1 &&
          (target === document.body || target === document.documentElement)
        )
          e.preventDefault();
        return;
      }
      const cell = target?.closest<HTMLElement>('[data-indicator-cell]');
      if (cell && container.current?.contains(cell)) {
        // The cell holds the whole reading even if the burst was noticed late; if it held text
        // before the burst began, the burst alone is the reading.
        const value = cell instanceof HTMLInputElement ? cell.value : (text ?? '');
        const whole = text && !parseReadingLine(value).ok && value.endsWith(text) ? text : value;
        // Where Enter moves on anyway, a reading typed by hand is read the same way (comma, sign,
        // unit) and shown; where Enter does more (fixing a hole), only an indicator's is taken and
        // its Enter is held back.
        const typedReading = live.current.enterMovesOn && parseReadingLine(whole).ok;
        if (text !== null || typedReading) arrive(whole, cell.dataset.indicatorCell ?? null, 'number');
        if (text !== null && !live.current.enterMovesOn) {
          e.preventDefault();
          e.stopPropagation();
        }
      } else if (text !== null && live.current.capture && !editable(target)) {
        e.preventDefault();
        e.stopPropagation();
        arrive(text, null, 'number');
      }
    };
    // On the way back up, React has drawn what the key changed: the page is free for the next one.
    const onDone = () => burst.done(performance.now());
    // On the way down (capture phase) the document hears a key before React does, so an Enter can be held back.
    document.addEventListener('keydown', onKey, true);
    document.addEventListener('keydown', onDone);
    document.addEventListener('input', onDone);
    return () => {
      document.removeEventListener('keydown', onKey, true);
      document.removeEventListener('keydown', onDone);
      document.removeEventListener('input', onDone);
    };
  }, [arrive]);

  useEffect(() => serialIndicator.receive((line) => arrive(line, null, live.current.lineFormat)), [arrive]);

  const setCapture = useCallback((on: boolean) => {
    sessionStorage.setItem(CAPTURE_KEY, on ? 'on' : 'off');
    setCaptureState(on);
  }, []);
  const setLineFormat = useCallback((f: LineFormat) => {
    localStorage.setItem(FORMAT_KEY, f);
    setLineFormatState(f);
  }, []);
  const containerRef = useCallback((el: HTMLElement | null) => {
    container.current = el;
  }, []);
  const lastRef = useRef(last);
  useLayoutEffect(() => {
    lastRef.current = last;
  });
  const undo = useCallback(() => {
    const a = lastRef.current;
    if (!a) return;
    a.undo?.();
    setLast(null);
    // Sent into a selected cell: that cell is selected again, so the next reading goes there.
    const box = container.current;
    if (a.cell !== null && a.inCell && box) {
      const el = box.querySelector<HTMLElement>(`[data-indicator-cell="${CSS.escape(a.cell)}"]`);
      el?.focus();
      if (el instanceof HTMLInputElement) el.select();
    }
  }, []);

  return useMemo(
    () => ({ containerRef, capture, setCapture, lineFormat, setLineFormat, last, refused, undo }),
    [containerRef, capture, setCapture, lineFormat, setLineFormat, last, refused, undo],
  );
}
