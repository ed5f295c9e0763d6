import { ValidateBy, ValidateIf } from 'class-validator';
import { CLINICAL_SETTING_NEEDS_SIGN_OFF, type UpdateWardContactsRequest, WARD_POLICY_SETTING_FIELDS } from '@lockstep/shared';
import { ApiPropertyOptional, PickType } from '@nestjs/swagger';
import { UpdateWardPolicyDto } from './update-ward-policy.dto.js';

/**
 * What an admin changes alone: the ward's e-mail addresses. A clinical setting sent here is refused, naming
 * the field, with the way to change it (a proposed change that a charge nurse or a pharmacist signs off).
 */
export class UpdateWardContactsDto
  extends PickType(UpdateWardPolicyDto, ['pharmacyEmail', 'nurseInChargeEmail'] as const)
  implements UpdateWardContactsRequest {}

// Each clinical setting is named here only to be refused with that message (not as an unknown field).
for (const field of WARD_POLICY_SETTING_FIELDS) {
  ApiPropertyOptional({
    type: 'number',
    description: `Refused here: ${CLINICAL_SETTING_NEEDS_SIGN_OFF} (POST /api/wards/{wardId}/policy-changes)`,
  })(UpdateWardContactsDto.prototype, field);
  ValidateBy({ name: 'clinicalSettingNeedsSignOff', validator: { validate: () => false } }, { message: CLINICAL_SETTING_NEEDS_SIGN_OFF })(
    UpdateWardContactsDto.prototype,
    field,
  );
  ValidateIf((_object, value) => value !== undefined)(UpdateWardContactsDto.prototype, field);
}
