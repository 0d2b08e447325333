import { Column } from 'typeorm';

/**
 * The vehicle scope a knowledge-base row applies to (teardowns, possible causes, add-ons):
 * each field null = any. Shared by the entities that carry one.
 */
export abstract class VehicleScoped {
  @Column({ type: 'varchar', length: 40, nullable: true })
  make: string | null;

  @Column({ type: 'varchar', length: 60, nullable: true })
  model: string | null;

  @Column({ type: 'varchar', length: 60, nullable: true })
  engine: string | null;

  @Column({ type: 'integer', nullable: true })
  yearFrom: number | null;

  @Column({ type: 'integer', nullable: true })
  yearTo: number | null;
}
