import { Type } from 'class-transformer';
import { IsDefined, IsIn, IsInt, IsObject, IsOptional, IsPositive, ValidateNested } from 'class-validator';
import { SIGNOFF_ROLES, type CreateSignoffRequest, type SignoffRole } from '@lockstep/shared';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { PumpSettingsDto } from '../../bedside/dto/pump-settings.dto.js';
import { SignatureDto } from '../../common/dto/signature.dto.js';

export class CreateSignoffDto implements CreateSignoffRequest {
  @ApiProperty({ type: 'integer', minimum: 1, example: 2, description: 'The PCA order being confirmed' })
  @IsPositive({ message: 'orderId must be positive' })
  @IsInt({ message: 'orderId must be a whole number' })
  @IsDefined({ message: 'Choose the PCA to confirm' })
  orderId: number;

  @ApiProperty({ enum: SIGNOFF_ROLES, example: 'incoming', description: 'Whether the signer is the outgoing or incoming nurse' })
  @IsIn(SIGNOFF_ROLES, { message: 'role is outgoing or incoming' })
  @IsDefined({ message: 'Say whether you are the outgoing or incoming nurse' })
  role: SignoffRole;

  /** The incoming nurse's blind reading of the pump, compared with the running order; required for them. */
  @ApiPropertyOptional({
    type: () => PumpSettingsDto,
    nullable: true,
    description: 'The incoming nurse re-enters the pump’s settings as read off it (required for the incoming nurse)',
  })
  @ValidateNested()
  @Type(() => PumpSettingsDto)
  @IsObject({ message: 'settings must be the pump settings' })
  @IsOptional()
  settings?: PumpSettingsDto | null;

  @ApiProperty({ type: () => SignatureDto, description: 'The nurse signs with their own password' })
  @ValidateNested()
  @Type(() => SignatureDto)
  @IsObject({ message: 'signature must be an object with your password' })
  @IsDefined({ message: 'signature is required: enter your password to sign' })
  signature: SignatureDto;
}
