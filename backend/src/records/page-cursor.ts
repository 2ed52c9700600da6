/**
 * Record lists come newest first a page at a time. The cursor of the next page is the id of the
 * last record of this one: the server looks up where that record stands, so the client needs
 * nothing but the list it already has, and no time has to survive a round trip to the browser.
 */
export const DEFAULT_PAGE_SIZE = 50;
/** The response header that carries the next page's cursor; absent on the last page. */
export const NEXT_CURSOR_HEADER = 'X-Next-Cursor';
