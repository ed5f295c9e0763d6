import { Type } from 'class-transformer';
import {
  IsDefined,
  IsIn,
  IsInt,
  IsObject,
  IsOptional,
  IsPositive,
  IsString,
  MaxLength,
  MinLength,
  ValidateBy,
  ValidateNested,
} from 'class-validator';
import {
  type DeclineWardPolicyChangeRequest,
  MIN_REASON_LENGTH,
  type ProposeWardPolicyChangeRequest,
  WARD_POLICY_CHANGE_STATUSES,
  WARD_POLICY_SETTING_FIELDS,
  type WardPolicyChangeStatus,
} from '@lockstep/shared';
import { ApiProperty, ApiPropertyOptional, OmitType } from '@nestjs/swagger';
import { SignedRequestDto } from '../../common/dto/signature.dto.js';
import { Trim } from '../../common/validation/trim.decorator.js';
import { UpdateWardPolicyDto } from './update-ward-policy.dto.js';

/** The clinical settings a proposal changes: each ward policy setting but the e-mail addresses, with the same rules and floors. */
export class WardPolicySettingChangesDto extends OmitType(UpdateWardPolicyDto, ['pharmacyEmail', 'nurseInChargeEmail'] as const) {}

const SETTINGS = new Set<string>(WARD_POLICY_SETTING_FIELDS);
/** At least one setting named (an unknown key is refused on its own, naming it). */
const NamesASetting = () =>
  ValidateBy(
    {
      name: 'namesASetting',
      validator: {
        validate: (value) => typeof value === 'object' && value !== null && Object.keys(value).some((key) => SETTINGS.has(key)),
      },
    },
    { message: 'Change at least one setting' },
  );

const TOO_LONG = 'At most 1,000 characters';

/** An admin proposes a change to a ward's clinical settings, with the reason, signed with their password. */
export class ProposeWardPolicyChangeDto extends SignedRequestDto implements ProposeWardPolicyChangeRequest {
  @ApiProperty({
    type: () => WardPolicySettingChangesDto,
    description: 'The settings to change and their new values; each may tighten the policy, never loosen it past its floor',
  })
  @NamesASetting()
  @ValidateNested()
  @Type(() => WardPolicySettingChangesDto)
  @IsObject({ message: 'changes must be an object of settings' })
  @IsDefined({ message: 'Choose the settings to change' })
  changes: WardPolicySettingChangesDto;

  @ApiProperty({
    minLength: MIN_REASON_LENGTH,
    maxLength: 1000,
    example: 'Post-operative patients on this ward are older: flag an SpO2 of 92 % too',
    description: 'Why the change is proposed; shown to the charge nurse or pharmacist who signs it off',
  })
  @Trim()
  @MaxLength(1000, { message: TOO_LONG })
  @MinLength(MIN_REASON_LENGTH, { message: `Give a reason of at least ${MIN_REASON_LENGTH} characters` })
  @IsString({ message: 'Give the reason for the change' })
  @IsDefined({ message: 'Give the reason for the change' })
  reason: string;
}

/** A charge nurse or pharmacist declines a proposed change, with the reason, signed; nothing changes. */
export class DeclineWardPolicyChangeDto extends SignedRequestDto implements DeclineWardPolicyChangeRequest {
  @ApiProperty({
    minLength: MIN_REASON_LENGTH,
    maxLength: 1000,
    example: 'Two-hourly observations after 24 hours are enough on this ward',
    description: 'Why the change is declined; shown to the admin who proposed it',
  })
  @Trim()
  @MaxLength(1000, { message: TOO_LONG })
  @MinLength(MIN_REASON_LENGTH, { message: `Give a reason of at least ${MIN_REASON_LENGTH} characters` })
  @IsString({ message: 'Give the reason for declining' })
  @IsDefined({ message: 'Give the reason for declining' })
  reason: string;
}

export class WardPolicyChangesQueryDto {
  @ApiPropertyOptional({ enum: WARD_POLICY_CHANGE_STATUSES, description: 'Only changes with this status' })
  @IsIn(WARD_POLICY_CHANGE_STATUSES, { message: `status is one of ${WARD_POLICY_CHANGE_STATUSES.join(', ')}` })
  @IsOptional()
  status?: WardPolicyChangeStatus;

  @ApiPropertyOptional({ type: 'integer', minimum: 1, example: 1, description: 'Only this ward’s changes' })
  @IsPositive({ message: 'wardId must be positive' })
  @IsInt({ message: 'wardId must be a whole number' })
  @Type(() => Number)
  @IsOptional()
  wardId?: number;
}
