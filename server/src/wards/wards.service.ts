import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import type { Repository } from 'typeorm';
import type { Ward as WardResponse } from '@lockstep/shared';
import { toWardResponse } from './dto/ward-response.js';
import { Ward } from './entities/ward.entity.js';

@Injectable()
export class WardsService {
  constructor(@InjectRepository(Ward) private readonly wards: Repository<Ward>) {}

  async list(): Promise<WardResponse[]> {
    const wards = await this.wards.find({ order: { name: 'ASC' } });
    return wards.map(toWardResponse);
  }
}
