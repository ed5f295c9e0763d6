import { IsBoolean, IsDefined, IsIn, IsInt, IsOptional, IsPositive } from 'class-validator';
import { SIGNOFF_ROLES, type CreateSignoffRequest, type SignoffRole } from '@lockstep/shared';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';

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

  /** The incoming nurse confirms the pump settings match the order (a re-check at handover). */
  @ApiPropertyOptional({ type: 'boolean', example: true, description: 'The incoming nurse confirms the pump settings match the order' })
  @IsBoolean({ message: 'pumpSettingsMatch must be true or false' })
  @IsOptional()
  pumpSettingsMatch?: boolean;
}
