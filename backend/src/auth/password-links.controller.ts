import { Body, Controller, Get, HttpCode, Param, Post } from '@nestjs/common';
import { Public } from './decorators.js';
import { PasswordResetDto } from './dto/password-reset.dto.js';
import { PasswordLinksService } from './password-links.service.js';

/** The set-your-password page's two calls; public, the token is the credential. */
@Controller('auth/password-reset')
export class PasswordLinksController {
  constructor(private readonly links: PasswordLinksService) {}

  @Public()
  @Get(':token')
  inspect(@Param('token') token: string) {
    return this.links.inspect(token);
  }

  @Public()
  @Post()
  @HttpCode(200)
  setPassword(@Body() dto: PasswordResetDto) {
    return this.links.setPassword(dto.token, dto.password);
  }
}
