import { Controller, Get, Header, Param, Res } from '@nestjs/common';
import type { FastifyReply } from 'fastify';
import { Public } from '../auth/decorators.js';
import { PublicVerificationService } from './signing/public-verification.service.js';
import { create as contentDisposition } from 'content-disposition';
import { ApiProduces } from '@nestjs/swagger';

/** Open to anyone: the address on a certificate, its signed record and the key that checks it. */
@Controller('public')
@Public()
export class PublicVerificationController {
  constructor(private readonly verification: PublicVerificationService) {}

  @Get('signing-key')
  @ApiProduces('text/plain')
  @Header('Content-Type', 'text/plain; charset=utf-8')
  @Header('Content-Disposition', 'inline; filename="railwright-signing-key.pem"')
  signingKey() {
    return this.verification.publicKey();
  }

  @Get('verify/:token')
  @Header('Cache-Control', 'no-store')
  verify(@Param('token') token: string) {
    return this.verification.verify(token);
  }

  @Get('verify/:token/record.json')
  async record(@Param('token') token: string, @Res({ passthrough: true }) reply: FastifyReply) {
    const { record, filename } = await this.verification.record(token);
    reply.header('Cache-Control', 'no-store');
    reply.header('Content-Disposition', contentDisposition(filename));
    return record;
  }
}
