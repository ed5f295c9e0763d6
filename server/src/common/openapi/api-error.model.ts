import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import type { ApiError, FieldError } from '@lockstep/shared';

/** OpenAPI model of FieldError (shared/src/api/api-error.schema.ts); documentation only. */
export class FieldErrorModel implements FieldError {
  @ApiProperty({ description: 'The failing input, a dotted path', example: 'settings.lockoutMinutes' })
  field: string;

  @ApiProperty({ description: 'What is wrong, in words a nurse could act on', example: 'Lockout must be at least 1 minute' })
  message: string;

  @ApiPropertyOptional({ type: 'integer', description: 'For an uploaded CSV: the row (header = 1)', example: 4 })
  row?: number;

  @ApiPropertyOptional({ description: 'For an uploaded CSV: the column', example: 'demandDose.hardMax' })
  column?: string;
}

/** OpenAPI model of the one shape every error answer has. */
export class ApiErrorModel implements ApiError {
  @ApiProperty({ type: 'integer', example: 400 })
  statusCode: number;

  @ApiProperty({ example: 'Lockout must be at least 1 minute' })
  message: string;

  @ApiPropertyOptional({ type: () => [FieldErrorModel], description: 'On a 400 for bad input: each failing field' })
  errors?: FieldErrorModel[];
}
