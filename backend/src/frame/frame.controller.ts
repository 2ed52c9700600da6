import { Body, Controller, Delete, Get, HttpCode, Param, ParseUUIDPipe, Post } from '@nestjs/common';
import { CurrentUser, Roles } from '../auth/decorators.js';
import type { SessionUser } from '../auth/session-user.js';
import type { Role } from '../database/schema/users.js';
import { BedGridsService } from './bed-grids.service.js';
import { DiagonalChecksService } from './diagonal-checks.service.js';
import { CreateBedGridDto } from './dto/create-bed-grid.dto.js';
import { CreateDiagonalCheckDto } from './dto/create-diagonal-check.dto.js';
import { CreateTestCutDto } from './dto/create-test-cut.dto.js';
import { TestCutsService } from './test-cuts.service.js';
import { ConflictsWhen } from '../openapi/error-responses.js';

// Builders square and level the frame as they build it; the test cut is a technician's job.
const FRAME_RECORDERS: Role[] = ['admin', 'owner', 'technician', 'builder'];
const CUT_RECORDERS: Role[] = ['admin', 'owner', 'technician'];

@Controller('machines/:id')
export class FrameController {
  constructor(
    private readonly diagonals: DiagonalChecksService,
    private readonly grids: BedGridsService,
    private readonly cuts: TestCutsService,
  ) {}

  @Post('diagonal-checks')
  @Roles(...FRAME_RECORDERS)
  @ConflictsWhen('approval-lock')
  createDiagonalCheck(
    @CurrentUser() user: SessionUser,
    @Param('id', ParseUUIDPipe) id: string,
    @Body() dto: CreateDiagonalCheckDto,
  ) {
    return this.diagonals.create(user, id, dto);
  }

  @Get('diagonal-checks')
  listDiagonalChecks(@CurrentUser() user: SessionUser, @Param('id', ParseUUIDPipe) id: string) {
    return this.diagonals.list(user, id);
  }

  @Post('bed-grids')
  @Roles(...FRAME_RECORDERS)
  @ConflictsWhen('approval-lock')
  createBedGrid(
    @CurrentUser() user: SessionUser,
    @Param('id', ParseUUIDPipe) id: string,
    @Body() dto: CreateBedGridDto,
  ) {
    return this.grids.create(user, id, dto);
  }

  @Get('bed-grids')
  listBedGrids(@CurrentUser() user: SessionUser, @Param('id', ParseUUIDPipe) id: string) {
    return this.grids.list(user, id);
  }

  @Post('test-cuts')
  @Roles(...CUT_RECORDERS)
  @ConflictsWhen('approval-lock')
  createTestCut(
    @CurrentUser() user: SessionUser,
    @Param('id', ParseUUIDPipe) id: string,
    @Body() dto: CreateTestCutDto,
  ) {
    return this.cuts.create(user, id, dto);
  }

  @Get('test-cuts')
  listTestCuts(@CurrentUser() user: SessionUser, @Param('id', ParseUUIDPipe) id: string) {
    return this.cuts.list(user, id);
  }

  @Delete('diagonal-checks/:recordId')
  @HttpCode(204)
  @Roles(...FRAME_RECORDERS)
  @ConflictsWhen('approval-lock')
  deleteDiagonalCheck(
    @CurrentUser() user: SessionUser,
    @Param('id', ParseUUIDPipe) id: string,
    @Param('recordId', ParseUUIDPipe) recordId: string,
  ) {
    return this.diagonals.remove(user, id, recordId);
  }

  @Delete('bed-grids/:recordId')
  @HttpCode(204)
  @Roles(...FRAME_RECORDERS)
  @ConflictsWhen('approval-lock')
  deleteBedGrid(
    @CurrentUser() user: SessionUser,
    @Param('id', ParseUUIDPipe) id: string,
    @Param('recordId', ParseUUIDPipe) recordId: string,
  ) {
    return this.grids.remove(user, id, recordId);
  }

  @Delete('test-cuts/:recordId')
  @HttpCode(204)
  @Roles(...CUT_RECORDERS)
  @ConflictsWhen('approval-lock')
  deleteTestCut(
    @CurrentUser() user: SessionUser,
    @Param('id', ParseUUIDPipe) id: string,
    @Param('recordId', ParseUUIDPipe) recordId: string,
  ) {
    return this.cuts.remove(user, id, recordId);
  }
}
