import {
  Body,
  Controller,
  Delete,
  Get,
  Header,
  HttpCode,
  Param,
  Post,
  Put,
  Query,
  Res,
  UploadedFile,
  UseFilters,
  UseInterceptors,
} from '@nestjs/common';
import { FileInterceptor } from '@nestjs/platform-express';
import type { Response } from 'express';
import {
  type ImportPreview,
  type LibraryAffectedOrders,
  type LibraryDiff,
  type LibraryVersion,
  type LibraryVersionDetail,
  PHARMACY_ROLES,
} from '@lockstep/shared';
import { ApiBody, ApiConsumes, ApiCreatedResponse, ApiHeader, ApiOkResponse, ApiOperation, ApiProduces } from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser } from '../auth/decorators/current-user.decorator.js';
import { Roles } from '../auth/decorators/roles.decorator.js';
import { ApiErrors } from '../common/openapi/api-errors.decorator.js';
import { ParseIdPipe } from '../common/pipes/parse-id.pipe.js';
import { ApproveVersionDto } from './dto/approve-version.dto.js';
import { CreateDraftDto } from './dto/create-draft.dto.js';
import { ImportLibraryUploadModel } from './dto/import-library-upload.model.js';
import { ImportLibraryDto } from './dto/import-library.dto.js';
import { LibraryQueryDto } from './dto/library-query.dto.js';
import { ReplaceRulesDto } from './dto/replace-rules.dto.js';
import { SendBackVersionDto } from './dto/send-back-version.dto.js';
import { SubmitVersionDto } from './dto/submit-version.dto.js';
import { AffectedOrdersService } from './affected-orders.service.js';
import { LibraryCsvService, type UploadedCsv } from './library-csv.service.js';
import { MAX_LIBRARY_CSV_BYTES } from './library-csv-limit.js';
import { LibraryVersionsService } from './library-versions.service.js';
import { LibraryService } from './library.service.js';
import { UploadTooLargeFilter } from './upload-too-large.filter.js';

/** Anyone signed in reads the library; only pharmacists write it. */
@Controller('library')
export class LibraryController {
  constructor(
    private readonly library: LibraryService,
    private readonly versions: LibraryVersionsService,
    private readonly csv: LibraryCsvService,
    private readonly affected: AffectedOrdersService,
  ) {}

  @ApiOperation({ summary: 'Dose-limit library versions' })
  @Get('versions')
  list(@Query() query: LibraryQueryDto): Promise<LibraryVersion[]> {
    return this.library.list(query.wardId);
  }

  @ApiOperation({ summary: 'One library version with its rules' })
  @ApiErrors(404)
  @Get('versions/:id')
  get(@Param('id', ParseIdPipe) id: number): Promise<LibraryVersionDetail> {
    return this.library.getVersion(id);
  }

  @ApiOperation({ summary: 'A version’s changes against the ward’s active version' })
  @ApiErrors(404)
  @Get('versions/:id/diff')
  diff(@Param('id', ParseIdPipe) id: number): Promise<LibraryDiff & { againstVersionId: number | null }> {
    return this.library.diff(id);
  }

  @ApiOperation({ summary: 'Open orders on the ward (verified or running) that the version’s limits would put outside' })
  @ApiErrors(404)
  @Get('versions/:id/affected-orders')
  @Roles(...PHARMACY_ROLES)
  affectedOrders(@Param('id', ParseIdPipe) id: number): Promise<LibraryAffectedOrders> {
    return this.affected.affectedOrders(id);
  }

  @ApiOperation({ summary: 'A version’s rules as CSV (docs/library-csv.md)' })
  @ApiProduces('text/csv')
  @ApiErrors(404)
  @Get('versions/:id/export')
  @Header('Content-Type', 'text/csv; charset=utf-8')
  async export(@Param('id', ParseIdPipe) id: number, @Res({ passthrough: true }) response: Response): Promise<string> {
    const { filename, csv } = await this.csv.export(id);
    response.setHeader('Content-Disposition', `attachment; filename="${filename}"`);
    return csv;
  }

  @ApiOperation({ summary: 'Start a draft from the ward’s active version' })
  @ApiErrors(409)
  @Post('versions')
  @Roles(...PHARMACY_ROLES)
  createDraft(@Body() body: CreateDraftDto, @CurrentUser() user: AuthUser): Promise<LibraryVersionDetail> {
    return this.versions.createDraft(body.wardId, body.note, user);
  }

  @ApiOperation({ summary: 'Replace a draft’s rules' })
  @ApiErrors(404, 409)
  @Put('versions/:id/rules')
  @Roles(...PHARMACY_ROLES)
  replaceRules(
    @Param('id', ParseIdPipe) id: number,
    @Body() body: ReplaceRulesDto,
    @CurrentUser() user: AuthUser,
  ): Promise<LibraryVersionDetail> {
    return this.versions.replaceRules(id, body.rules, user);
  }

  @ApiOperation({ summary: 'Submit a draft for a second pharmacist’s approval' })
  @ApiErrors(404, 409)
  @Post('versions/:id/submit')
  @HttpCode(200)
  @Roles(...PHARMACY_ROLES)
  submit(
    @Param('id', ParseIdPipe) id: number,
    @Body() body: SubmitVersionDto,
    @CurrentUser() user: AuthUser,
  ): Promise<LibraryVersionDetail> {
    return this.versions.submit(id, body.note, user);
  }

  @ApiOperation({ summary: 'Withdraw a submitted version back to draft' })
  @ApiErrors(404, 409)
  @Post('versions/:id/withdraw')
  @HttpCode(200)
  @Roles(...PHARMACY_ROLES)
  withdraw(@Param('id', ParseIdPipe) id: number, @CurrentUser() user: AuthUser): Promise<LibraryVersionDetail> {
    return this.versions.withdraw(id, user);
  }

  @ApiOperation({
    summary: 'Send a submitted version back to draft with a comment (signed; a pharmacist who did not write it)',
  })
  @ApiHeader({
    name: 'Idempotency-Key',
    required: false,
    description: 'Sent by the client with each write; a send-back repeated after it succeeded is refused (409), and nothing changes',
  })
  @ApiErrors(404, 409)
  @Post('versions/:id/send-back')
  @HttpCode(200)
  @Roles(...PHARMACY_ROLES)
  sendBack(
    @Param('id', ParseIdPipe) id: number,
    @Body() body: SendBackVersionDto,
    @CurrentUser() user: AuthUser,
  ): Promise<LibraryVersionDetail> {
    return this.versions.sendBack(id, user, body.signature.password, body.comment);
  }

  @ApiOperation({
    summary: 'Approve a submitted version (signed; a pharmacist who did not create, import, edit or submit it); it becomes active',
  })
  @ApiErrors(404, 409)
  @Post('versions/:id/approve')
  @HttpCode(200)
  @Roles(...PHARMACY_ROLES)
  approve(
    @Param('id', ParseIdPipe) id: number,
    @Body() body: ApproveVersionDto,
    @CurrentUser() user: AuthUser,
  ): Promise<LibraryVersionDetail> {
    return this.versions.approve(id, user, body.signature.password, body.submittedAt);
  }

  @ApiOperation({ summary: 'Delete a draft' })
  @ApiErrors(404, 409)
  @Delete('versions/:id')
  @HttpCode(204)
  @Roles(...PHARMACY_ROLES)
  discard(@Param('id', ParseIdPipe) id: number, @CurrentUser() user: AuthUser): Promise<void> {
    return this.versions.discard(id, user);
  }

  /** Multipart: `file` (CSV), `wardId`, optional `note`; `dryRun=true` previews without writing. */
  @ApiOperation({ summary: 'Import a CSV as a new draft, or check it without writing (dryRun=true)' })
  @ApiConsumes('multipart/form-data')
  @ApiBody({ type: ImportLibraryUploadModel })
  @ApiCreatedResponse({ description: 'The new draft version' })
  @ApiOkResponse({ description: 'With dryRun: the rules the file holds and its problems; nothing written' })
  @ApiErrors(409)
  @Post('import')
  @Roles(...PHARMACY_ROLES)
  @UseFilters(UploadTooLargeFilter)
  @UseInterceptors(FileInterceptor('file', { limits: { fileSize: MAX_LIBRARY_CSV_BYTES, files: 1 } }))
  async import(
    @Body() body: ImportLibraryDto,
    @UploadedFile() file: UploadedCsv | undefined,
    @CurrentUser() user: AuthUser,
    @Res({ passthrough: true }) response: Response,
  ): Promise<LibraryVersionDetail | ImportPreview> {
    if (body.dryRun) {
      response.status(200);
      return this.csv.preview(body.wardId, file);
    }
    return this.csv.import(body.wardId, file, body.note, user);
  }
}
