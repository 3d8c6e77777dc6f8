import {
  Column,
  CreateDateColumn,
  Entity,
  JoinColumn,
  ManyToOne,
  OneToMany,
  PrimaryColumn,
  PrimaryGeneratedColumn,
  UpdateDateColumn,
  type Relation,
} from 'typeorm';
import { StoredFileRecord } from '../../storage/stored-file-record';
import { User } from '../../users/user.entity';
import { Product } from '../product.entity';
import { Radio } from '../radio.entity';
import { ANTENNA_ROLES, type AntennaRole } from './antenna-roles';

/**
 * An N-port Touchstone file measured (or simulated) with the antennas in the product's own enclosure.
 * The S-matrix is packed as float64 (see in-product-network.ts): element by element, Re/Im interleaved.
 */
@Entity({ name: 'in_product_measurements' })
export class InProductMeasurement extends StoredFileRecord {
  @PrimaryGeneratedColumn({ unsigned: true }) id: number;

  @Column({ name: 'product_id', type: 'int', unsigned: true }) productId: number;

  @ManyToOne(() => Product, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'product_id' })
  product: Relation<Product>;

  @Column({ type: 'varchar', length: 500, nullable: true }) note: string | null;
  @Column({ name: 'source_format', type: 'varchar', length: 60 }) sourceFormat: string;
  @Column({ type: 'smallint', unsigned: true }) ports: number;
  /** One reference resistance per port, ohms, as JSON. */
  @Column({ name: 'reference_ohms', type: 'simple-json' }) referenceOhms: number[];
  @Column({ name: 'point_count', type: 'int', unsigned: true }) pointCount: number;
  @Column({ name: 'from_hz', type: 'double' }) fromHz: number;
  @Column({ name: 'to_hz', type: 'double' }) toHz: number;
  @Column({ name: 'frequencies_hz', type: 'longblob', select: false }) frequenciesHz: Buffer;
  @Column({ name: 's_matrix', type: 'longblob', select: false }) sMatrix: Buffer;

  @Column({ name: 'uploaded_by_id', type: 'int', unsigned: true, nullable: true }) uploadedById: number | null;

  @ManyToOne(() => User, { onDelete: 'SET NULL' })
  @JoinColumn({ name: 'uploaded_by_id' })
  uploadedBy: User | null;

  @OneToMany(() => InProductPort, (p) => p.measurement)
  portMapping: Relation<InProductPort>[];

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3 }) createdAt: Date;
  @UpdateDateColumn({ name: 'updated_at', type: 'datetime', precision: 3 }) updatedAt: Date;
}

/** Which radio's antenna, in which role, a port of an in-product measurement is. */
@Entity({ name: 'in_product_ports' })
export class InProductPort {
  @PrimaryColumn({ name: 'measurement_id', type: 'int', unsigned: true }) measurementId: number;
  @PrimaryColumn({ type: 'smallint', unsigned: true }) port: number;
  @Column({ name: 'radio_id', type: 'int', unsigned: true }) radioId: number;
  @Column({ type: 'enum', enum: ANTENNA_ROLES }) role: AntennaRole;

  @ManyToOne(() => InProductMeasurement, (m) => m.portMapping, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'measurement_id' })
  measurement: Relation<InProductMeasurement>;

  @ManyToOne(() => Radio, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'radio_id' })
  radio: Relation<Radio>;
}

export const IN_PRODUCT_ENTITIES = [InProductMeasurement, InProductPort];
