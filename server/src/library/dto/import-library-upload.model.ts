import { ApiProperty } from '@nestjs/swagger';
import { ImportLibraryDto } from './import-library.dto.js';

/** The multipart body of `POST /api/library/import` as OpenAPI shows it: the text fields and the file. Documentation only. */
export class ImportLibraryUploadModel extends ImportLibraryDto {
  @ApiProperty({ type: 'string', format: 'binary', description: 'The CSV file (docs/library-csv.md), at most 1 MB' })
  file: unknown;
}
