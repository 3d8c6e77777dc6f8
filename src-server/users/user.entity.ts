import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import type { Role } from '../common/roles';

export type UserStatus = 'invited' | 'active' | 'deactivated';

@Entity({ name: 'users' })
export class User {
  @PrimaryGeneratedColumn({ unsigned: true })
  id: number;

  @Column({ type: 'varchar', length: 254 })
  email: string;

  @Column({ type: 'varchar', length: 120 })
  name: string;

  @Column({ type: 'enum', enum: ['procurement', 'engineer', 'admin'] })
  role: Role;

  @Column({ type: 'enum', enum: ['invited', 'active', 'deactivated'], default: 'invited' })
  status: UserStatus;

  @Column({ name: 'password_hash', type: 'varchar', length: 100, nullable: true, select: false })
  passwordHash: string | null;

  /** Bumped on deactivation and password change; tokens carrying an older value stop working. */
  @Column({ name: 'token_version', type: 'int', unsigned: true, default: 0 })
  tokenVersion: number;

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3 })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'datetime', precision: 3 })
  updatedAt: Date;
}
