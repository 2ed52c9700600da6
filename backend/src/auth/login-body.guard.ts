import { BadRequestException, CanActivate, ExecutionContext, Injectable } from '@nestjs/common';
import { plainToInstance } from 'class-transformer';
import { validate } from 'class-validator';
import { LoginDto } from './dto/login.dto.js';
import { LoginThrottle } from './login-throttle.js';

/**
 * Guards run before pipes, so the sign-in body is checked here, before passport sees it:
 * a malformed body is a 400, and a throttled address a 429, before any password is compared.
 */
@Injectable()
export class LoginBodyGuard implements CanActivate {
  constructor(private readonly throttle: LoginThrottle) {}

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
    this.throttle.assertAllowed(req.ip, dto.email);
    return true;
  }
}
