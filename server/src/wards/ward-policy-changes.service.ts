import { ConflictException, ForbiddenException, Injectable, NotFoundException } from '@nestjs/common';
import { DataSource, type EntityManager, type FindOptionsWhere } from 'typeorm';
import {
  WARD_POLICY_SETTING_FIELDS,
  type WardPolicy,
  type WardPolicyChange as WardPolicyChangeResponse,
  type WardPolicySettingField,
  wardPolicyApprovalRefusal,
  wardPolicyFloorErrors,
} from '@lockstep/shared';
import type { AuthUser } from '../auth/auth-user.js';
import { recordAudit } from '../audit/record-audit.js';
import { fieldError, fieldErrors } from '../common/errors/field-error.js';
import { UsersService } from '../users/users.service.js';
import type { DeclineWardPolicyChangeDto, ProposeWardPolicyChangeDto, WardPolicyChangesQueryDto } from './dto/ward-policy-change.dto.js';
import { WardPolicyChange, type WardPolicySettingChange } from './entities/ward-policy-change.entity.js';
import { Ward } from './entities/ward.entity.js';
import { wardPolicy } from './ward-policy.js';

const RELATIONS = { ward: true, proposedBy: true, decidedBy: true } as const;
const MAX_IDEMPOTENCY_KEY = 200;

/** A setting's value as the ward works to it (`wardPolicy`: held at the floors). Read by name, so new settings need no change here. */
const currentValue = (ward: Ward, field: string): number =>
  (wardPolicy(ward) as Record<keyof WardPolicy, number>)[field as keyof WardPolicy];

function toResponse(change: WardPolicyChange): WardPolicyChangeResponse {
  return {
    id: change.id,
    wardId: change.wardId,
    wardName: change.ward.name,
    status: change.status,
    settings: change.settings.map(({ field, from, to }) => ({ field, from, to })),
    reason: change.reason,
    proposedBy: { id: change.proposedBy.id, name: change.proposedBy.displayName },
    proposedAt: change.proposedAt.toISOString(),
    decidedBy: change.decidedBy ? { id: change.decidedBy.id, name: change.decidedBy.displayName } : null,
    decidedAt: change.decidedAt?.toISOString() ?? null,
    declineReason: change.declineReason,
  };
}

/** `{ field: { from, to } }` for each setting: the audit summary's usual shape. */
const settingsSummary = (settings: WardPolicySettingChange[]) =>
  Object.fromEntries(settings.map(({ field, from, to }) => [field, { from, to }]));

/**
 * A ward's clinical settings change in two steps: an admin proposes (signed), and a charge nurse or a
 * pharmacist who did not propose it signs it off (signed), which applies it, or declines it. One pending
 * change per ward; each step is one transaction with its audit event.
 */
@Injectable()
export class WardPolicyChangesService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly users: UsersService,
  ) {}

  async list(query: WardPolicyChangesQueryDto): Promise<WardPolicyChangeResponse[]> {
    const where: FindOptionsWhere<WardPolicyChange> = {};
    if (query.status) where.status = query.status;
    if (query.wardId) where.wardId = query.wardId;
    const changes = await this.dataSource.manager.find(WardPolicyChange, {
      where,
      relations: RELATIONS,
      order: { proposedAt: 'DESC', id: 'DESC' },
    });
    return changes.map(toResponse);
  }

  async propose(
    wardId: number,
    body: ProposeWardPolicyChangeDto,
    admin: AuthUser,
    idempotencyKey?: string,
  ): Promise<WardPolicyChangeResponse> {
    if (idempotencyKey !== undefined && (idempotencyKey.length === 0 || idempotencyKey.length > MAX_IDEMPOTENCY_KEY)) {
      throw fieldError('Idempotency-Key', `The Idempotency-Key header is 1 to ${MAX_IDEMPOTENCY_KEY} characters`);
    }
    await this.users.verifySignature(admin.id, body.signature.password);
    return this.dataSource.transaction(async (manager) => {
      // The same proposal sent again (a retry after a lost answer) gets the change it made.
      if (idempotencyKey) {
        const earlier = await manager.findOne(WardPolicyChange, {
          where: { proposedById: admin.id, idempotencyKey },
          relations: RELATIONS,
        });
        if (earlier && earlier.wardId !== wardId) {
          throw new ConflictException(`This Idempotency-Key was sent with change #${earlier.id} to ${earlier.ward.name}: send a new key`);
        }
        if (earlier) return toResponse(earlier);
      }
      const ward = await manager.findOneBy(Ward, { id: wardId });
      if (!ward) throw new NotFoundException(`No ward with id ${wardId}`);

      const proposed = Object.entries(body.changes).filter(
        (entry): entry is [WardPolicySettingField, number] =>
          entry[1] !== undefined && WARD_POLICY_SETTING_FIELDS.includes(entry[0] as WardPolicySettingField),
      );
      // The DTO holds each setting to its floor; checked again here, as the rule the ward works to.
      const floors = wardPolicyFloorErrors(Object.fromEntries(proposed));
      if (Object.keys(floors).length > 0) {
        throw fieldErrors(
          'A setting is past its floor',
          Object.entries(floors).map(([field, message]) => ({ field: `changes.${field}`, message })),
        );
      }
      const settings = proposed
        .map(([field, to]) => ({ field, from: currentValue(ward, field), to }))
        .filter(({ from, to }) => from !== to);
      if (settings.length === 0) {
        throw fieldError('changes', 'Every setting proposed already has that value on this ward: change at least one');
      }
      await this.refuseWhilePending(manager, wardId);

      const change = await manager.save(WardPolicyChange, {
        wardId,
        status: 'pending' as const,
        settings,
        reason: body.reason,
        proposedById: admin.id,
        proposedAt: new Date(),
        idempotencyKey: idempotencyKey ?? null,
        decidedById: null,
        decidedAt: null,
        declineReason: null,
      });
      await recordAudit(manager, admin, {
        action: 'ward.policy-change-propose',
        entityType: 'ward',
        entityId: wardId,
        summary: { change: change.id, ...settingsSummary(settings), reason: body.reason, signed: true },
      });
      return toResponse(await this.load(manager, change.id));
    });
  }

  /** Applies the change's settings to the ward: the signer is a charge nurse or pharmacist who did not propose it. */
  async signOff(changeId: number, password: string, approver: AuthUser): Promise<WardPolicyChangeResponse> {
    await this.users.verifySignature(approver.id, password);
    return this.dataSource.transaction(async (manager) => {
      const change = await this.pendingChange(manager, changeId, approver, 'sign off');
      const ward = await manager.findOneByOrFail(Ward, { id: change.wardId });
      const moved = change.settings.filter(({ field, from }) => currentValue(ward, field) !== from);
      if (moved.length > 0) {
        const which = moved.map(({ field, from }) => `${field} is now ${currentValue(ward, field)} (was ${from} when proposed)`).join('; ');
        throw new ConflictException(
          `The ward's policy changed since change #${change.id} was proposed: ${which}. Decline it and propose again`,
        );
      }
      const now = new Date();
      await manager.update(Ward, { id: ward.id }, Object.fromEntries(change.settings.map(({ field, to }) => [field, to])));
      await manager.update(
        WardPolicyChange,
        { id: change.id, status: 'pending' },
        { status: 'applied', decidedById: approver.id, decidedAt: now },
      );
      // The ward's usual policy event (each field from and to), by the approver; the proposer is named beside it.
      await recordAudit(manager, approver, {
        action: 'ward.policy-update',
        entityType: 'ward',
        entityId: ward.id,
        summary: { ...settingsSummary(change.settings), change: change.id, proposedBy: change.proposedBy.displayName, signed: true },
      });
      return toResponse(await this.load(manager, change.id));
    });
  }

  /** Declines the change, with the reason: nothing on the ward changes. */
  async decline(changeId: number, body: DeclineWardPolicyChangeDto, approver: AuthUser): Promise<WardPolicyChangeResponse> {
    await this.users.verifySignature(approver.id, body.signature.password);
    return this.dataSource.transaction(async (manager) => {
      const change = await this.pendingChange(manager, changeId, approver, 'decline');
      await manager.update(
        WardPolicyChange,
        { id: change.id, status: 'pending' },
        { status: 'declined', decidedById: approver.id, decidedAt: new Date(), declineReason: body.reason },
      );
      await recordAudit(manager, approver, {
        action: 'ward.policy-change-decline',
        entityType: 'ward',
        entityId: change.wardId,
        summary: { change: change.id, proposedBy: change.proposedBy.displayName, reason: body.reason, signed: true },
      });
      return toResponse(await this.load(manager, change.id));
    });
  }

  private async load(manager: EntityManager, id: number): Promise<WardPolicyChange> {
    return manager.findOneOrFail(WardPolicyChange, { where: { id }, relations: RELATIONS });
  }

  private async refuseWhilePending(manager: EntityManager, wardId: number): Promise<void> {
    const pending = await manager.findOne(WardPolicyChange, { where: { wardId, status: 'pending' }, order: { id: 'ASC' } });
    if (pending) {
      throw new ConflictException(
        `Change #${pending.id} to this ward's policy awaits a second sign-off: sign off or decline change #${pending.id} first`,
      );
    }
  }

  /** The change, still pending, that `approver` may decide: 404, 403 (the proposer, or not a charge nurse or pharmacist), 409. */
  private async pendingChange(manager: EntityManager, id: number, approver: AuthUser, doing: string): Promise<WardPolicyChange> {
    const change = await manager.findOne(WardPolicyChange, { where: { id }, relations: RELATIONS });
    if (!change) throw new NotFoundException(`No ward policy change with id ${id}`);
    const refusal = wardPolicyApprovalRefusal(change.proposedById, approver);
    if (refusal) throw new ForbiddenException(refusal);
    if (change.status !== 'pending') {
      throw new ConflictException(`Change #${change.id} was already ${change.status}: there is nothing to ${doing}`);
    }
    return change;
  }
}
