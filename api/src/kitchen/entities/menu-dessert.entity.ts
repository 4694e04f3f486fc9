import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryColumn } from 'typeorm';
import { DessertEntity } from './dessert.entity.js';
import { MenuEntity } from './menu.entity.js';

/** A dessert served on a menu, in order. Goes with its menu (CASCADE); keeps its dessert (RESTRICT). */
@Entity({ name: 'menu_desserts' })
export class MenuDessertEntity {
  @PrimaryColumn({ name: 'menu_id', type: 'varchar', length: 36 })
  menuId: string;

  @ManyToOne(() => MenuEntity, { onDelete: 'CASCADE', nullable: false })
  @JoinColumn({ name: 'menu_id' })
  menu?: MenuEntity;

  @PrimaryColumn({ type: 'integer' })
  position: number;

  @Index('IDX_menu_desserts_dessert')
  @Column({ name: 'dessert_id', type: 'varchar', length: 36 })
  dessertId: string;

  @ManyToOne(() => DessertEntity, { onDelete: 'RESTRICT', nullable: false })
  @JoinColumn({ name: 'dessert_id' })
  dessert?: DessertEntity;
}
