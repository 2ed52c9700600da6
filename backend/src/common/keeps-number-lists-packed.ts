const keeping = new WeakSet<object>();

/**
 * A DTO whose long number lists may reach its service as Float64Arrays when the body was large
 * enough to be parsed in the worker thread (markPackedBody). For a calculation that hands the
 * lists straight back to the engine pool: making plain arrays of them and packing them again held
 * the event loop 20–30 ms per 200 000-point fit. Its service must only read such a list by index
 * and `length` (`arrayToMm` does), never store or answer it as it is.
 */
export function KeepsNumberListsPacked(): ClassDecorator {
  return (target) => {
    keeping.add(target);
  };
}

export function keepsNumberListsPacked(type: object): boolean {
  return keeping.has(type);
}
