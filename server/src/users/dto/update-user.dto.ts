import { IsBoolean, ValidateIf } from 'class-validator';
import type { UpdateUserRequest } from '@lockstep/shared';
// @nestjs/swagger's mapped types copy the validation rules exactly as @nestjs/mapped-types does,
// and the OpenAPI properties too.
import { ApiPropertyOptional, OmitType, PartialType } from '@nestjs/swagger';
import { CreateUserDto } from './create-user.dto.js';

/**
 * A username never changes: the audit trail refers to it. Absent fields stay as they are; a null
 * is validated (and refused) rather than skipped, so it can never blank a required column.
 */
export class UpdateUserDto
  extends PartialType(OmitType(CreateUserDto, ['username'] as const), { skipNullProperties: false })
  implements UpdateUserRequest
{
  @ApiPropertyOptional({ type: 'boolean', example: false, description: 'false deactivates the user: their sessions end at once' })
  @IsBoolean({ message: 'active must be true or false' })
  @ValidateIf((_, value) => value !== undefined)
  active?: boolean;
}
