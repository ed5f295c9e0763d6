import { Controller, Get } from '@nestjs/common';
import type { Drug } from '@lockstep/shared';
import { DrugsService } from './drugs.service.js';

@Controller('drugs')
export class DrugsController {
  constructor(private readonly drugs: DrugsService) {}

  @Get()
  list(): Promise<Drug[]> {
    return this.drugs.list();
  }
}
