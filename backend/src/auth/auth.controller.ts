import { Controller, Get, HttpCode, Post, Req, Res, UseGuards } from '@nestjs/common';
import { AuthGuard } from '@nestjs/passport';
import { ApiBody } from '@nestjs/swagger';
import type { FastifyReply, FastifyRequest } from 'fastify';
import { CurrentUser, Public } from './decorators.js';
import { LoginDto } from './dto/login.dto.js';
import { LoginBodyGuard } from './login-body.guard.js';
import { toUserResponse, type SessionUser } from './session-user.js';
import { ConfigService } from '@nestjs/config';
import type { RailwrightConfig } from '../config/app-config.module.js';

@Controller('auth')
export class AuthController {
  constructor(private readonly config: ConfigService<RailwrightConfig, true>) {}

  @Public()
  @Post('login')
  @HttpCode(200)
  @UseGuards(LoginBodyGuard, AuthGuard('local'))
  // Passport reads the body (checked by LoginBodyGuard against LoginDto), so it is described here.
  @ApiBody({ type: LoginDto })
  async login(@Req() req: FastifyRequest & { user: SessionUser }) {
    // A new session id on sign-in, so a planted id cannot be taken over.
    await req.session.regenerate();
    req.session.set('userId', req.user.id);
    // The start of the absolute lifetime (common/session-lifetime.ts).
    req.session.set('createdAt', Date.now());
    return { user: toUserResponse(req.user) };
  }

  @Public()
  @Post('logout')
  @HttpCode(204)
  async logout(@Req() req: FastifyRequest, @Res({ passthrough: true }) reply: FastifyReply) {
    if (req.session) await req.session.destroy();
    reply.clearCookie(this.config.get('app', { infer: true }).sessionCookieName, { path: '/' });
  }

  @Get('me')
  me(@CurrentUser() user: SessionUser) {
    return { user: toUserResponse(user) };
  }
}
