import { IsDefined, IsISO8601, IsRFC3339 } from 'class-validator';
import type { ApproveVersionRequest } from '@lockstep/shared';
import { ApiProperty } from '@nestjs/swagger';
import { SignedRequestDto } from '../../common/dto/signature.dto.js';

/**
 * The approver signs the submission they reviewed. A version can be withdrawn, edited and
 * submitted again while a second pharmacist has it open; naming the submission makes the server
 * refuse an approval of rules its signer never saw.
 */
export class ApproveVersionDto extends SignedRequestDto implements ApproveVersionRequest {
  @ApiProperty({
    format: 'date-time',
    example: '2030-01-01T10:00:00.000Z',
    description: 'The `submittedAt` of the version as the approver reviewed it',
  })
  @IsRFC3339({ message: 'submittedAt must be the time the reviewed version was submitted' })
  @IsISO8601({ strict: true }, { message: 'submittedAt must be the time the reviewed version was submitted' })
  @IsDefined({ message: 'submittedAt is required: the submission you reviewed' })
  submittedAt: string;
}
