import { IsBoolean, IsDefined, IsIn, IsInt, IsOptional, IsPositive } from 'class-validator';
import { SIGNOFF_ROLES, type SignoffRole } from '@lockstep/shared';

export class CreateSignoffDto {
  @IsPositive({ message: 'orderId must be positive' })
  @IsInt({ message: 'orderId must be a whole number' })
  @IsDefined({ message: 'Choose the PCA to confirm' })
  orderId: number;

  @IsIn(SIGNOFF_ROLES, { message: 'role is outgoing or incoming' })
  @IsDefined({ message: 'Say whether you are the outgoing or incoming nurse' })
  role: SignoffRole;

  /** The incoming nurse confirms the pump settings match the order (a re-check at handover). */
  @IsBoolean({ message: 'pumpSettingsMatch must be true or false' })
  @IsOptional()
  pumpSettingsMatch?: boolean;
}
