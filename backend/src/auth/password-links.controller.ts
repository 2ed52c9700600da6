import { Body, Controller, Get, HttpCode, Param, Post, Req } from '@nestjs/common';
import type { FastifyRequest } from 'fastify';
import { Public } from './decorators.js';
import { ForgotPasswordDto } from './dto/forgot-password.dto.js';
import { PasswordResetDto } from './dto/password-reset.dto.js';
import { PasswordLinksService } from './password-links.service.js';

/** The set-your-password page's two calls and the sign-in page's "forgot password"; public, the token is the credential. */
@Controller('auth/password-reset')
export class PasswordLinksController {
  constructor(private readonly links: PasswordLinksService) {}

  @Public()
  @Post('request')
  @HttpCode(202)
  async request(@Body() dto: ForgotPasswordDto, @Req() req: FastifyRequest) {
    await this.links.requestByEmail(dto.email, req.ip);
    return {
      message:
        'If an active account uses this address, a link to choose a new password is on its way. It works once, for 72 hours.',
    };
  }

  @Public()
  @Get(':token')
  inspect(@Param('token') token: string) {
    return this.links.inspect(token);
  }

  /** Sets the password and signs the person in, on a new session id. */
  @Public()
  @Post()
  @HttpCode(200)
  async setPassword(@Body() dto: PasswordResetDto, @Req() req: FastifyRequest) {
    const { email, userId } = await this.links.setPassword(dto.token, dto.password);
    await req.session.regenerate();
    req.session.set('userId', userId);
    req.session.set('createdAt', Date.now());
    return { email, signedIn: true };
  }
}
