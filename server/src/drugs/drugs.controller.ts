import { Controller, Get } from '@nestjs/common';
import type { Drug } from '@lockstep/shared';
import { ApiOperation } from '@nestjs/swagger';
import { DrugsService } from './drugs.service.js';

@Controller('drugs')
export class DrugsController {
  constructor(private readonly drugs: DrugsService) {}

  @ApiOperation({ summary: 'The drugs and their dose units' })
  @Get()
  list(): Promise<Drug[]> {
    return this.drugs.list();
  }
}
