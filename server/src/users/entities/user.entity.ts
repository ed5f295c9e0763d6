import { Column, CreateDateColumn, Entity, JoinTable, ManyToMany, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import type { Role } from '@lockstep/shared';
import { Ward } from '../../wards/entities/ward.entity.js';

@Entity('users')
export class User {
  @PrimaryGeneratedColumn()
  id: number;

  @Column({ type: 'varchar', length: 64, unique: true })
  username: string;

  @Column({ type: 'varchar', length: 120 })
  displayName: string;

  @Column({ type: 'varchar', length: 20 })
  role: Role;

  /** For notices about this person's own work (a returned order, say); may be empty. */
  @Column({ type: 'varchar', length: 200, default: '' })
  email: string;

  @Column({ type: 'varchar', length: 100 })
  passwordHash: string;

  @Column({ type: 'boolean', default: true })
  active: boolean;

  @ManyToMany(() => Ward)
  @JoinTable({ name: 'user_wards', joinColumn: { name: 'userId' }, inverseJoinColumn: { name: 'wardId' } })
  wards: Ward[];

  @CreateDateColumn()
  createdAt: Date;

  @UpdateDateColumn()
  updatedAt: Date;
}
