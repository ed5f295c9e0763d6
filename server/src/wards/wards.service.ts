import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import type { Repository } from 'typeorm';
import { type Ward as WardResponse, type WardPolicySettings } from '@lockstep/shared';
import type { UpdateWardContactsDto } from './dto/update-ward-contacts.dto.js';
import { wardPolicy } from './ward-policy.js';
import { toWardResponse } from './dto/ward-response.js';
import { Ward } from './entities/ward.entity.js';
import type { AuthUser } from '../auth/auth-user.js';
import { changedFields, recordAudit } from '../audit/record-audit.js';

@Injectable()
export class WardsService {
  constructor(@InjectRepository(Ward) private readonly wards: Repository<Ward>) {}

  async list(): Promise<WardResponse[]> {
    const wards = await this.wards.find({ order: { name: 'ASC' } });
    return wards.map(toWardResponse);
  }

  async policy(wardId: number): Promise<WardPolicySettings> {
    const ward = await this.wards.findOneBy({ id: wardId });
    if (!ward) throw new NotFoundException(`No ward with id ${wardId}`);
    return { ...wardPolicy(ward), pharmacyEmail: ward.pharmacyEmail, nurseInChargeEmail: ward.nurseInChargeEmail };
  }

  /** The ward's e-mail addresses; the admin changes them alone (clinical settings: WardPolicyChangesService). */
  async updatePolicy(wardId: number, changes: UpdateWardContactsDto, admin: AuthUser): Promise<WardPolicySettings> {
    await this.wards.manager.transaction(async (manager) => {
      const ward = await manager.findOneBy(Ward, { id: wardId });
      if (!ward) throw new NotFoundException(`No ward with id ${wardId}`);
      const contacts = { pharmacyEmail: changes.pharmacyEmail, nurseInChargeEmail: changes.nurseInChargeEmail };
      const changed = changedFields(ward, contacts);
      if (Object.keys(changed).length === 0) return;
      await manager.update(Ward, { id: wardId }, Object.fromEntries(Object.entries(contacts).filter(([, value]) => value !== undefined)));
      await recordAudit(manager, admin, { action: 'ward.policy-update', entityType: 'ward', entityId: wardId, summary: changed });
    });
    return this.policy(wardId);
  }
}
