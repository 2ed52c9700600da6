import { BadRequestException, CanActivate, ExecutionContext, Injectable } from '@nestjs/common';
import { plainToInstance } from 'class-transformer';
import { validate } from 'class-validator';
import type { FastifyReply } from 'fastify';
import { LoginDto } from './dto/login.dto.js';
import { SignInThrottle, SignInThrottled } from './login-throttle.js';

/**
 * Guards run before pipes, so the sign-in body is checked here, before passport sees it:
 * a malformed body is a 400; then the attempt is counted, and a throttled account or address is
 * a 429 with Retry-After, before any password is compared.
 */
@Injectable()
export class LoginBodyGuard implements CanActivate {
  constructor(private readonly throttle: SignInThrottle) {}

  async canActivate(ctx: ExecutionContext): Promise<boolean> {
    const req = ctx.switchToHttp().getRequest();
    const body = req.body;
    if (!body || typeof body !== 'object' || Array.isArray(body)) {
      throw new BadRequestException(['The body must be a JSON object with email and password']);
    }
    const dto = plainToInstance(LoginDto, body);
    const errors = await validate(dto, { whitelist: true, forbidNonWhitelisted: true });
    if (errors.length) {
      throw new BadRequestException(errors.flatMap((e) => Object.values(e.constraints ?? {})));
    }
    try {
      await this.throttle.check(dto.email, req.ip);
    } catch (err) {
      if (err instanceof SignInThrottled)
        ctx.switchToHttp().getResponse<FastifyReply>().header('retry-after', String(err.retryAfterSeconds));
      throw err;
    }
    return true;
  }
}
