import { useSyncExternalStore } from 'react';
import { LineSplitter, webSerial, type LineEnding, type SerialPortLike } from './web-serial';

export interface SerialState {
  status: 'unavailable' | 'idle' | 'connecting' | 'connected' | 'error';
  message: string | null;
}

type LineListener = (line: string) => void;

/**
 * The one serial indicator of this page. It lives outside any grid so the connection outlasts the
 * screens that use it (the bolt-down guide mounts a new panel for every hole); the most recently
 * mounted grid receives the lines.
 */
class SerialIndicator {
  private state: SerialState = { status: webSerial() ? 'idle' : 'unavailable', message: null };
  private watchers = new Set<() => void>();
  private receivers: LineListener[] = [];
  private port: SerialPortLike | null = null;
  private reader: ReadableStreamDefaultReader<Uint8Array> | null = null;

  get = () => this.state;
  watch = (w: () => void) => {
    this.watchers.add(w);
    return () => this.watchers.delete(w);
  };
  receive(listener: LineListener) {
    this.receivers.push(listener);
    return () => {
      this.receivers = this.receivers.filter((l) => l !== listener);
    };
  }

  private set(state: SerialState) {
    this.state = state;
    this.watchers.forEach((w) => w());
  }

  async connect(baudRate: number, ending: LineEnding) {
    const serial = webSerial();
    if (!serial) return;
    this.set({ status: 'connecting', message: null });
    try {
      const port = await serial.requestPort();
      await port.open({ baudRate });
      this.port = port;
      this.set({ status: 'connected', message: null });
      void this.read(port, ending);
    } catch (err) {
      // Closing the port picker without choosing is not an error worth a red message.
      const cancelled = err instanceof DOMException && err.name === 'NotFoundError';
      this.set(
        cancelled
          ? { status: 'idle', message: null }
          : { status: 'error', message: `Could not open the port: ${(err as Error).message}` },
      );
    }
  }

  private async read(port: SerialPortLike, ending: LineEnding) {
    const lines = new LineSplitter(ending);
    const decoder = new TextDecoder();
    try {
      while (port.readable) {
        this.reader = port.readable.getReader();
        for (;;) {
          const { value, done } = await this.reader.read();
          if (done) break;
          for (const line of lines.push(decoder.decode(value, { stream: true }))) this.receivers.at(-1)?.(line);
        }
        this.reader.releaseLock();
        if (this.port !== port) return;
        break;
      }
      if (this.port === port) this.set({ status: 'idle', message: 'The indicator closed the connection.' });
    } catch (err) {
      if (this.port === port)
        this.set({ status: 'error', message: `The connection dropped: ${(err as Error).message}` });
    } finally {
      if (this.port === port) this.port = null;
    }
  }

  async disconnect() {
    const port = this.port;
    this.port = null;
    try {
      await this.reader?.cancel();
      await port?.close();
    } catch {
      // Already gone (cable pulled): nothing left to close.
    }
    this.set({ status: webSerial() ? 'idle' : 'unavailable', message: null });
  }
}

export const serialIndicator = new SerialIndicator();

export const useSerialState = () => useSyncExternalStore(serialIndicator.watch, serialIndicator.get);
