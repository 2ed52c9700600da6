import { ArgumentsHost, Catch, ExceptionFilter } from '@nestjs/common';
import type { FastifyReply } from 'fastify';
import { EngineInputError } from '../engine/engine-input-error.js';

/**
 * Input the measurement engine cannot evaluate is the caller's mistake: answer 400 with the
 * engine's message, which names the field, in the same shape as the validation pipe's answers.
 */
@Catch(EngineInputError)
export class EngineInputErrorFilter implements ExceptionFilter {
  catch(exception: EngineInputError, host: ArgumentsHost) {
    const reply = host.switchToHttp().getResponse<FastifyReply>();
    reply.status(400).send({
      statusCode: 400,
      error: 'Bad Request',
      message: [exception.message],
      ...(exception.field ? { field: exception.field } : {}),
    });
  }
}
