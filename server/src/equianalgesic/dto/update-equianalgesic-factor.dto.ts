import { IsDefined, IsIn, IsNumber, IsPositive, IsString, Max, MaxLength, MinLength } from 'class-validator';
import {
  DOSE_UNITS,
  EQUIANALGESIC_MAX_AMOUNT,
  EQUIANALGESIC_SOURCE_MAX_LENGTH,
  type DoseUnit,
  type UpdateEquianalgesicFactorRequest,
} from '@lockstep/shared';
import { ApiProperty } from '@nestjs/swagger';
import { SignedRequestDto } from '../../common/dto/signature.dto.js';
import { Trim } from '../../common/validation/trim.decorator.js';

const finite = { allowNaN: false, allowInfinity: false };

/** A pharmacist's change to one row of the equianalgesic table, signed with their password. */
export class UpdateEquianalgesicFactorDto extends SignedRequestDto implements UpdateEquianalgesicFactorRequest {
  @ApiProperty({
    minimum: 0,
    exclusiveMinimum: true,
    maximum: EQUIANALGESIC_MAX_AMOUNT,
    example: 2,
    description: 'The amount of the drug by this route taken as equal to 10 mg parenteral morphine (1 mcg to 1,000 mg once in mg)',
  })
  @Max(EQUIANALGESIC_MAX_AMOUNT, { message: 'Amount is at most 1,000,000' })
  @IsPositive({ message: 'Amount must be more than 0' })
  @IsNumber(finite, { message: 'Amount must be a number' })
  @IsDefined({ message: 'Enter the amount' })
  amount: number;

  @ApiProperty({ enum: DOSE_UNITS, example: 'mg' })
  @IsIn(DOSE_UNITS, { message: 'Unit must be mg or mcg' })
  @IsDefined({ message: 'Choose the unit' })
  unit: DoseUnit;

  @ApiProperty({
    minLength: 1,
    maxLength: EQUIANALGESIC_SOURCE_MAX_LENGTH,
    example: 'NCI PDQ Cancer Pain (health professional version), equianalgesic table, 2014',
    description: 'The published source that states this factor',
  })
  @Trim()
  @MaxLength(EQUIANALGESIC_SOURCE_MAX_LENGTH, { message: 'Source is at most 500 characters' })
  @MinLength(1, { message: 'Name the source of this factor' })
  @IsString({ message: 'Source must be text' })
  @IsDefined({ message: 'Name the source of this factor' })
  source: string;
}
