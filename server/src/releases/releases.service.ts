import { ConflictException, Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { randomInt } from 'node:crypto';
import type { DataSource, EntityManager } from 'typeorm';
import {
  formatDose,
  ORDER_STATUS_LABELS,
  openReleases,
  releaseCode,
  secondReleaseRefusal,
  USUAL_SYRINGE_ML,
  type FieldError,
  type SyringeReleaseResponse,
} from '@lockstep/shared';
import type { AuthUser } from '../auth/auth-user.js';
import { MailService } from '../mail/mail.service.js';
import { syringeReleasedMail } from '../orders/order-notifications.js';
import { OrdersService } from '../orders/orders.service.js';
import { toReleaseResponse } from './dto/release-response.js';
import { releaseAuditSummary } from './release-audit.js';
import type { CreateReleaseDto } from './dto/create-release.dto.js';
import { SyringeRelease } from './entities/syringe-release.entity.js';
import { WardEventsService } from '../ward-events/ward-events.service.js';
import { recordAudit } from '../audit/record-audit.js';
import { fieldErrors } from '../common/errors/field-error.js';

// Concentrations are decimals; compare them with a tolerance, never bit for bit.
const SAME_CONCENTRATION = 1e-9;

/** Pharmacy releases a labelled syringe of the order's concentration for a verified or active order. */
@Injectable()
export class ReleasesService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly orders: OrdersService,
    private readonly mail: MailService,
    private readonly events: WardEventsService,
  ) {}

  async release(orderId: number, dto: CreateReleaseDto, pharmacist: AuthUser): Promise<SyringeReleaseResponse> {
    const { order, release } = await this.dataSource.transaction(async (manager) => {
      const found = await this.orders.load(manager, orderId);
      if (found.status !== 'verified' && found.status !== 'active') {
        throw new ConflictException({
          statusCode: 409,
          message: `Syringes are released for verified or active orders; this one is ${ORDER_STATUS_LABELS[found.status].toLowerCase()}`,
          currentStatus: found.status,
        });
      }
      checkRelease(dto, found.concentrationPerMl, found.doseUnit);
      // Read inside the write transaction (transactions are queued one at a time), so two releases at once cannot both pass.
      const existing = await manager.find(SyringeRelease, { where: { orderId }, order: { id: 'ASC' } });
      const refusal = secondReleaseRefusal(existing, dto.secondSyringeReason);
      if (refusal) {
        throw new ConflictException({
          statusCode: 409,
          message: refusal,
          field: 'secondSyringeReason',
          openReleaseCodes: openReleases(existing).map((release) => release.releaseCode),
        });
      }
      const secondSyringe = openReleases(existing).length > 0;
      const saved = await manager.save(
        manager.create(SyringeRelease, {
          orderId,
          releaseCode: await uniqueCode(manager),
          status: 'ready',
          concentrationPerMl: dto.concentrationPerMl,
          volumeMl: dto.volumeMl,
          batch: dto.batch.trim(),
          expiresAt: new Date(dto.expiresAt),
          preparedBy: dto.preparedBy.trim(),
          checkedBy: dto.checkedBy.trim(),
          overrideReason: dto.overrideReason?.trim() ?? null,
          releasedById: pharmacist.id,
          releasedAt: new Date(),
        }),
      );
      await recordAudit(manager, pharmacist, {
        action: 'order.release',
        entityType: 'order',
        entityId: orderId,
        summary: {
          ...releaseAuditSummary(saved),
          ...(secondSyringe
            ? {
                secondSyringeReason: dto.secondSyringeReason?.trim(),
                alongside: openReleases(existing).map((release) => release.releaseCode),
              }
            : {}),
        },
      });
      return {
        order: found,
        release: await manager.findOneOrFail(SyringeRelease, { where: { id: saved.id }, relations: { releasedBy: true } }),
      };
    });
    this.mail.send(syringeReleasedMail(order, release));
    this.events.publishForOrder(orderId, 'release');
    return toReleaseResponse(release, order.doseUnit);
  }
}

function checkRelease(dto: CreateReleaseDto, orderedConcentration: number, doseUnit: string): void {
  const errors: FieldError[] = [];
  if (Math.abs(dto.concentrationPerMl - orderedConcentration) > SAME_CONCENTRATION) {
    errors.push({
      field: 'concentrationPerMl',
      message: `The order is for ${formatDose(orderedConcentration, `${doseUnit}/mL`)}; the syringe must match it`,
    });
  }
  const unusual = dto.volumeMl < USUAL_SYRINGE_ML.min || dto.volumeMl > USUAL_SYRINGE_ML.max;
  if (unusual && !dto.overrideReason?.trim()) {
    errors.push({ field: 'overrideReason', message: `${formatDose(dto.volumeMl, 'mL')} is outside the usual 20–60 mL: give a reason` });
  }
  if (new Date(dto.expiresAt).getTime() <= Date.now()) {
    errors.push({ field: 'expiresAt', message: 'The expiry must be later than now' });
  }
  if (errors.length > 0) throw fieldErrors('The syringe release needs correcting', errors);
}

async function uniqueCode(manager: EntityManager): Promise<string> {
  for (let attempt = 0; attempt < 20; attempt++) {
    const code = releaseCode(randomInt);
    if (!(await manager.existsBy(SyringeRelease, { releaseCode: code }))) return code;
  }
  throw new Error('Could not find an unused release code');
}
