import { BadRequestException, ConflictException, Injectable, UnprocessableEntityException } from '@nestjs/common';
import { CommandKeysRepository } from './command-keys.repository.js';

/** Header of a command's client-made key, as HTTP APIs commonly name it. */
export const KEY_HEADER = 'idempotency-key';
const KEY_PATTERN = /^[A-Za-z0-9_-]{16,100}$/;
/** Answers larger than this are not kept: a repeat of such a command says it was already recorded. */
const KEEP_AT_MOST_BYTES = 256 * 1024;
const KEEP_DAYS = 30;
const PRUNE_EVERY = 500;

export interface KeyedCommand {
  key: string;
  userId: string;
  method: string;
  path: string;
}

/** A command sent again with its key: the first answer, unchanged. */
export class RepeatedCommand {
  constructor(readonly response: unknown) {}
}

/**
 * Exactly-once commands for entries queued offline: the first sending of a key runs the command
 * and keeps its answer in the same transaction; a later sending of the key (by the same person,
 * to the same route) gets that answer and changes nothing.
 */
@Injectable()
export class CommandKeys {
  private claims = 0;

  constructor(private readonly repo: CommandKeysRepository) {}

  /** The command's key from its header, or null when it has none; a malformed key is a 400. */
  static keyOf(header: string | string[] | undefined): string | null {
    if (header === undefined) return null;
    if (typeof header !== 'string' || !KEY_PATTERN.test(header)) {
      throw new BadRequestException(
        'The Idempotency-Key header must be 16 to 100 letters, digits, "-" or "_" (a UUID, for example)',
      );
    }
    return header;
  }

  /** Runs `command` once per key; returns its answer, or a RepeatedCommand with the first answer. */
  async once<T>(keyed: KeyedCommand, command: () => Promise<T>): Promise<T | RepeatedCommand> {
    if (!(await this.repo.claim(keyed.key, keyed.userId, keyed.method, keyed.path))) return this.repeat(keyed);
    if (++this.claims % PRUNE_EVERY === 0) await this.repo.forgetOlderThan(KEEP_DAYS);
    const answer = await command();
    const size = answer === undefined ? 0 : Buffer.byteLength(JSON.stringify(answer) ?? '');
    await this.repo.keepAnswer(keyed.key, size <= KEEP_AT_MOST_BYTES ? answer : undefined);
    return answer;
  }

  private async repeat(keyed: KeyedCommand): Promise<RepeatedCommand> {
    const first = await this.repo.find(keyed.key);
    if (!first) throw new ConflictException('This entry is being recorded right now; try again in a moment');
    // Another person's key, or the key of another command: never answered from, never run again.
    if (first.userId !== keyed.userId)
      throw new ConflictException('This entry was sent by someone else; it was not recorded again');
    if (first.method !== keyed.method || first.path !== keyed.path) {
      throw new UnprocessableEntityException(
        'This Idempotency-Key belongs to another command; make a new key for each entry',
      );
    }
    if (first.response === null) throw new ConflictException('This entry was already recorded; reload to see it');
    return new RepeatedCommand(first.response);
  }
}
