import { Controller, Get, Param } from '@nestjs/common';
import type { LibraryVersionDetail } from '@lockstep/shared';
import { ApiOperation } from '@nestjs/swagger';
import { ApiErrors } from '../common/openapi/api-errors.decorator.js';
import { ParseIdPipe } from '../common/pipes/parse-id.pipe.js';
import { LibraryService } from './library.service.js';

@Controller('wards/:wardId/library')
export class WardLibraryController {
  constructor(private readonly library: LibraryService) {}

  /** The ward's active version and its rules; any signed-in role. */
  @ApiOperation({ summary: 'The ward’s active dose-limit library and its rules' })
  @ApiErrors(404)
  @Get()
  active(@Param('wardId', ParseIdPipe) wardId: number): Promise<LibraryVersionDetail> {
    return this.library.getActive(wardId);
  }
}
