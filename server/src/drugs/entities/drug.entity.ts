import { Column, Entity, PrimaryGeneratedColumn } from 'typeorm';
import type { DoseUnit } from '@lockstep/shared';

@Entity('drugs')
export class Drug {
  @PrimaryGeneratedColumn()
  id: number;

  /** Lower-case generic name; screens show it through tallMan(). */
  @Column({ type: 'varchar', length: 80, unique: true })
  genericName: string;

  @Column({ type: 'varchar', length: 8 })
  doseUnit: DoseUnit;
}
