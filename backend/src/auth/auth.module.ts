import { Global, Module } from '@nestjs/common';
import { APP_GUARD } from '@nestjs/core';
import { PassportModule } from '@nestjs/passport';
import { MailModule } from '../mail/mail.module.js';
import { AuthController } from './auth.controller.js';
import { AuthRepository } from './auth.repository.js';
import { AuthService } from './auth.service.js';
import { LocalStrategy } from './local.strategy.js';
import { LoginBodyGuard } from './login-body.guard.js';
import { SignInThrottle } from './login-throttle.js';
import { SignInAttemptsRepository } from './sign-in-attempts.repository.js';
import { SessionAuthGuard } from './session-auth.guard.js';
import { PasswordLinksController } from './password-links.controller.js';
import { PasswordLinksRepository } from './password-links.repository.js';
import { PasswordLinksService } from './password-links.service.js';

@Global()
@Module({
  imports: [PassportModule.register({ session: false }), MailModule],
  controllers: [AuthController, PasswordLinksController],
  providers: [
    AuthRepository,
    AuthService,
    LocalStrategy,
    LoginBodyGuard,
    PasswordLinksRepository,
    PasswordLinksService,
    SignInAttemptsRepository,
    SignInThrottle,
    { provide: APP_GUARD, useClass: SessionAuthGuard },
  ],
  exports: [AuthService, PasswordLinksService, SignInThrottle],
})
export class AuthModule {}
