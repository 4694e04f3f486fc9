import { Column, Entity, PrimaryColumn } from 'typeorm';

export type GuestDataView = 'allergy_notes' | 'briefing' | 'briefing_pdf' | 'guest_list';

/** One opening of a guest's health data by the chef or staff (DESIGN.md, "Guest data is health data"). */
@Entity({ name: 'guest_data_access_log' })
export class GuestDataAccessEntity {
  @PrimaryColumn({ type: 'varchar', length: 36 })
  id: string;

  @Column({ name: 'order_id', type: 'varchar', length: 36 })
  orderId: string;

  @Column({ name: 'user_id', type: 'varchar', length: 36, nullable: true })
  userId: string | null;

  @Column({ type: 'varchar', length: 8 })
  role: string;

  @Column({ type: 'varchar', length: 20 })
  what: GuestDataView;

  @Column({ type: 'datetime' })
  at: Date;
}
