import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import type { DataSource } from 'typeorm';
import {
  type FhirBundle,
  type FhirMedicationRequest,
  type FhirOrderSource,
  toFhirMedicationRequest,
  toFhirPcaBundle,
} from '@lockstep/shared';
import { ORDER_SUMMARY_RELATIONS, toOrderSummary } from '../orders/dto/order-response.js';
import { PcaOrder } from '../orders/entities/pca-order.entity.js';
import { OrdersService } from '../orders/orders.service.js';
import { PatientsService } from '../patients/patients.service.js';

/** Reads orders for the FHIR export; the mapping itself is shared/src/fhir. Nothing is written. */
@Injectable()
export class FhirService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly orders: OrdersService,
    private readonly patients: PatientsService,
  ) {}

  async medicationRequest(orderId: number): Promise<FhirMedicationRequest> {
    return toFhirMedicationRequest(toFhirOrderSource(await this.orders.load(this.dataSource.manager, orderId)));
  }

  /** Every PCA order of the patient, in every status, oldest first. */
  async pcaBundle(patientId: number, baseUrl: string): Promise<FhirBundle> {
    await this.patients.get(patientId);
    const orders = await this.dataSource.manager.find(PcaOrder, {
      where: { patientId },
      relations: ORDER_SUMMARY_RELATIONS,
      order: { id: 'ASC' },
    });
    return toFhirPcaBundle(orders.map(toFhirOrderSource), { baseUrl, timestamp: new Date().toISOString() });
  }
}

function toFhirOrderSource(order: PcaOrder): FhirOrderSource {
  return { ...toOrderSummary(order), startedAt: order.startedAt?.toISOString() ?? null };
}
