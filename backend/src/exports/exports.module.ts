import { Module } from '@nestjs/common';
import { DrivesModule } from '../drives/drives.module.js';
import { FrameModule } from '../frame/frame.module.js';
import { MachinesModule } from '../machines/machines.module.js';
import { RailsModule } from '../rails/rails.module.js';
import { ExportsController } from './exports.controller.js';
import { ExportsService } from './exports.service.js';

/** CSV downloads of sweeps, travel trials, repeat-and-reverse runs and bed grids. */
@Module({
  imports: [MachinesModule, RailsModule, DrivesModule, FrameModule],
  controllers: [ExportsController],
  providers: [ExportsService],
})
export class ExportsModule {}
