import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Serial numbers behind assembly tag codes: one sequence, so codes are unique for ever. */
export class AssemblySerials1796166000000 implements MigrationInterface {
  name = 'AssemblySerials1796166000000';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`CREATE SEQUENCE "assembly_serial_seq" AS bigint START WITH 1 MINVALUE 1`);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP SEQUENCE "assembly_serial_seq"`);
  }
}
