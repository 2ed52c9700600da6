import { Module } from '@nestjs/common';
import { HistoryController } from './history.controller.js';

/** The workshop-level history; the records module (global) answers it. */
@Module({ controllers: [HistoryController] })
export class HistoryModule {}
