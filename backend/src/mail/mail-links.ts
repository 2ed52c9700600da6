import { Injectable } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import type { RailwrightConfig } from '../config/app-config.module.js';

/** The screens a message can send someone to; the API itself answers with ids, never with paths. */
export type MachineTab = 'readiness' | 'frame' | 'safety' | 'drives';

/**
 * Every full address the server writes for people to open outside the app (mail, the set-password
 * link, the certificate's verification address and QR code) is made here, from the configured
 * public URL. The API's answers carry ids; the front end makes its own links from them.
 */
@Injectable()
export class MailLinks {
  constructor(private readonly config: ConfigService<RailwrightConfig, true>) {}

  private get base(): string {
    return this.config.get('app', { infer: true }).appUrl.replace(/\/+$/, '');
  }

  machine(machineId: string, tab: MachineTab): string {
    return `${this.base}/machines/${encodeURIComponent(machineId)}?tab=${tab}`;
  }

  /** The public verification page printed on the certificate: anyone holding it can check the signature there. */
  verification(token: string): string {
    return `${this.base}/verify/${encodeURIComponent(token)}`;
  }

  setPassword(token: string): string {
    return `${this.base}/set-password?token=${encodeURIComponent(token)}`;
  }
}
