import { Module } from '@nestjs/common';
import { OrdersModule } from '../orders/orders.module.js';
import { PatientsModule } from '../patients/patients.module.js';
import { FhirController } from './fhir.controller.js';
import { FhirService } from './fhir.service.js';

@Module({
  imports: [OrdersModule, PatientsModule],
  controllers: [FhirController],
  providers: [FhirService],
})
export class FhirModule {}
