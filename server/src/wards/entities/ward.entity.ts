import { Column, Entity, PrimaryGeneratedColumn } from 'typeorm';

@Entity('wards')
export class Ward {
  @PrimaryGeneratedColumn()
  id: number;

  @Column({ type: 'varchar', length: 16, unique: true })
  code: string;

  @Column({ type: 'varchar', length: 120 })
  name: string;

  @Column({ type: 'varchar', length: 120 })
  specialty: string;

  /** Paediatric wards check doses per kg of body weight. */
  @Column({ type: 'boolean', default: false })
  weightBasedDosing: boolean;
}
