import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import type { Repository } from 'typeorm';
import type { Drug as DrugResponse } from '@lockstep/shared';
import { toDrugResponse } from './dto/drug-response.js';
import { Drug } from './entities/drug.entity.js';

@Injectable()
export class DrugsService {
  constructor(@InjectRepository(Drug) private readonly drugs: Repository<Drug>) {}

  async list(): Promise<DrugResponse[]> {
    const drugs = await this.drugs.find({ order: { genericName: 'ASC' } });
    return drugs.map(toDrugResponse);
  }
}
