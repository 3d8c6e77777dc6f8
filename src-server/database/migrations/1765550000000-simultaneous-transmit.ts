import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Which radios of a product may transmit at the same time (NULL: all of them), for the intermodulation check. */
export class SimultaneousTransmit1765550000000 implements MigrationInterface {
  name = 'SimultaneousTransmit1765550000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query('ALTER TABLE products ADD COLUMN simultaneous_transmit JSON NULL');
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query('ALTER TABLE products DROP COLUMN simultaneous_transmit');
  }
}
