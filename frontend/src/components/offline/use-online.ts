import { onlineManager } from '@tanstack/react-query';
import { useSyncExternalStore } from 'react';

// Made once: a new subscribe function on each render would make React subscribe again every time.
const subscribe = (onChange: () => void) => onlineManager.subscribe(onChange);
const isOnline = () => onlineManager.isOnline();

/** Whether the app thinks it can reach the server (TanStack Query pauses commands while it cannot). */
export const useOnline = () => useSyncExternalStore(subscribe, isOnline, () => true);
