import { OmitType, PartialType } from '@nestjs/mapped-types';
import { IsBoolean, ValidateIf } from 'class-validator';
import type { UpdateUserRequest } from '@lockstep/shared';
import { CreateUserDto } from './create-user.dto.js';

/**
 * A username never changes: the audit trail refers to it. Absent fields stay as they are; a null
 * is validated (and refused) rather than skipped, so it can never blank a required column.
 */
export class UpdateUserDto
  extends PartialType(OmitType(CreateUserDto, ['username'] as const), { skipNullProperties: false })
  implements UpdateUserRequest
{
  @IsBoolean({ message: 'active must be true or false' })
  @ValidateIf((_, value) => value !== undefined)
  active?: boolean;
}
