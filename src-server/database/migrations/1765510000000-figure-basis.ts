import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Issue 12, figures that mean what they say: every efficiency and gain states its basis, and a
 * datasheet efficiency whether it is the band's minimum or its average.
 *
 * Existing rows get the basis the data was always read with, which is also what the demo seed means:
 * - measured efficiency curves: `radiation`. The demo curves come from the resonator model's radiation
 *   efficiency (parts/demo/resonator-model.ts, CSV header "radiation efficiency (%)"), and the engine
 *   has always multiplied them by (1 − |Γ|²).
 * - measured gain curves (peak and average): `peak`, the antenna's gain without the mismatch: the demo
 *   writes gain = radiation efficiency (dB) + directivity (IEEE Std 145; Balanis §2.14), no |Γ| in it.
 * - spec bands: efficiency `radiation`, statistic `minimum`, gain `peak`. Search, figures and engine have
 *   always read the datasheet figure as the band's lowest radiation efficiency, and the demo's figures sit
 *   near the lowest radiation efficiency of the same parts' curves (1012: 55 % stated for 617–960 MHz, its
 *   radiation curve's lowest there 57.6 %; 1011: 30 % stated, lowest 28.3 %), above what total efficiency reaches.
 * New data states its basis (upload form field `basis`; spec bands `efficiencyBasis`, `efficiencyStatistic`, `gainBasis`).
 */
export class FigureBasis1765510000000 implements MigrationInterface {
  name = 'FigureBasis1765510000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE part_measurements ADD COLUMN basis ENUM('radiation','total','peak','realized') NULL AFTER kind`);
    await q.query(`UPDATE part_measurements SET basis = 'radiation' WHERE kind = 'efficiency'`);
    await q.query(`UPDATE part_measurements SET basis = 'peak' WHERE kind IN ('peak-gain','average-gain')`);
    // S11 has no basis; efficiency is radiation or total; gains peak or realized.
    await q.query(
      `ALTER TABLE part_measurements ADD CONSTRAINT chk_measurement_basis CHECK (
         (kind = 's11' AND basis IS NULL) OR (kind = 'efficiency' AND basis IN ('radiation','total'))
         OR (kind IN ('peak-gain','average-gain') AND basis IN ('peak','realized')))`,
    );
    await q.query(
      `ALTER TABLE part_spec_bands
         ADD COLUMN efficiency_basis ENUM('radiation','total') NOT NULL DEFAULT 'radiation' AFTER efficiency_pct,
         ADD COLUMN efficiency_statistic ENUM('minimum','average') NOT NULL DEFAULT 'minimum' AFTER efficiency_basis,
         ADD COLUMN gain_basis ENUM('peak','realized') NOT NULL DEFAULT 'peak' AFTER average_gain_dbi`,
    );
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query('ALTER TABLE part_spec_bands DROP COLUMN gain_basis, DROP COLUMN efficiency_statistic, DROP COLUMN efficiency_basis');
    await q.query('ALTER TABLE part_measurements DROP CONSTRAINT chk_measurement_basis');
    await q.query('ALTER TABLE part_measurements DROP COLUMN basis');
  }
}
