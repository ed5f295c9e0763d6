import { Controller, Get } from '@nestjs/common';
import { ApiOperation } from '@nestjs/swagger';
import { Public } from '../auth/decorators/public.decorator.js';

@Controller('health')
export class HealthController {
  @ApiOperation({ summary: 'Liveness check' })
  @Public()
  @Get()
  check(): { status: 'ok' } {
    return { status: 'ok' };
  }
}
