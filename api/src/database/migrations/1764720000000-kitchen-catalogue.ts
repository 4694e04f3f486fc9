import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * The kitchen catalogue: ingredients, recipes and their lines, plated desserts and their
 * components, menus and the desserts they serve. References are real rows with foreign keys, so
 * the database itself refuses to delete anything still in use (ON DELETE RESTRICT); a recipe's own
 * lines, a dessert's components and a menu's desserts go with their owner (ON DELETE CASCADE).
 * Value objects (allergens, dietary facts, composition, steps, equipment, photos) are JSON text.
 * Money is integer minor units.
 */
export class KitchenCatalogue1764720000000 implements MigrationInterface {
  name = 'KitchenCatalogue1764720000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE "ingredients" (
        "id" varchar(36) PRIMARY KEY NOT NULL,
        "name" varchar(120) NOT NULL,
        "label_name" varchar(300),
        "pack_size" double precision NOT NULL CHECK ("pack_size" > 0),
        "pack_unit" varchar(16) NOT NULL,
        "pack_price_minor" integer NOT NULL CHECK ("pack_price_minor" >= 0),
        "density_g_per_ml" double precision CHECK ("density_g_per_ml" > 0),
        "unit_weight_g" double precision CHECK ("unit_weight_g" > 0),
        "count_unit" varchar(8) CHECK ("count_unit" IN ('piece', 'leaf')),
        "allergens" text NOT NULL,
        "dietary" text NOT NULL,
        "composition" text,
        "notes" text,
        "created_at" datetime NOT NULL DEFAULT (datetime('now')),
        "updated_at" datetime NOT NULL DEFAULT (datetime('now'))
      )`);
    await queryRunner.query(`CREATE INDEX "IDX_ingredients_name" ON "ingredients" ("name")`);

    await queryRunner.query(`
      CREATE TABLE "recipes" (
        "id" varchar(36) PRIMARY KEY NOT NULL,
        "name" varchar(120) NOT NULL,
        "yield_g" double precision NOT NULL CHECK ("yield_g" > 0),
        "storage" varchar(8) NOT NULL CHECK ("storage" IN ('dry', 'chilled', 'frozen')),
        "shelf_life_hours" double precision NOT NULL CHECK ("shelf_life_hours" > 0),
        "steps" text NOT NULL,
        "equipment" text,
        "density_g_per_ml" double precision CHECK ("density_g_per_ml" > 0),
        "unit_weight_g" double precision CHECK ("unit_weight_g" > 0),
        "notes" text,
        "created_at" datetime NOT NULL DEFAULT (datetime('now')),
        "updated_at" datetime NOT NULL DEFAULT (datetime('now'))
      )`);
    await queryRunner.query(`CREATE INDEX "IDX_recipes_name" ON "recipes" ("name")`);

    // A line is an ingredient or a sub-recipe, never both, never the recipe itself.
    await queryRunner.query(`
      CREATE TABLE "recipe_lines" (
        "recipe_id" varchar(36) NOT NULL REFERENCES "recipes" ("id") ON DELETE CASCADE,
        "position" integer NOT NULL CHECK ("position" >= 0),
        "ingredient_id" varchar(36) REFERENCES "ingredients" ("id") ON DELETE RESTRICT,
        "sub_recipe_id" varchar(36) REFERENCES "recipes" ("id") ON DELETE RESTRICT,
        "quantity" double precision NOT NULL CHECK ("quantity" > 0),
        "unit" varchar(16) NOT NULL,
        "note" varchar(200),
        PRIMARY KEY ("recipe_id", "position"),
        CHECK (("ingredient_id" IS NULL) <> ("sub_recipe_id" IS NULL)),
        CHECK ("sub_recipe_id" IS NULL OR "sub_recipe_id" <> "recipe_id")
      )`);
    await queryRunner.query(
      `CREATE INDEX "IDX_recipe_lines_ingredient" ON "recipe_lines" ("ingredient_id")`,
    );
    await queryRunner.query(
      `CREATE INDEX "IDX_recipe_lines_sub_recipe" ON "recipe_lines" ("sub_recipe_id")`,
    );

    await queryRunner.query(`
      CREATE TABLE "desserts" (
        "id" varchar(36) PRIMARY KEY NOT NULL,
        "name" varchar(120) NOT NULL,
        "description" text,
        "plating_notes" text,
        "photos" text NOT NULL DEFAULT ('[]'),
        "created_at" datetime NOT NULL DEFAULT (datetime('now')),
        "updated_at" datetime NOT NULL DEFAULT (datetime('now'))
      )`);
    await queryRunner.query(`CREATE INDEX "IDX_desserts_name" ON "desserts" ("name")`);

    await queryRunner.query(`
      CREATE TABLE "dessert_components" (
        "dessert_id" varchar(36) NOT NULL REFERENCES "desserts" ("id") ON DELETE CASCADE,
        "position" integer NOT NULL CHECK ("position" >= 0),
        "recipe_id" varchar(36) NOT NULL REFERENCES "recipes" ("id") ON DELETE RESTRICT,
        "quantity" double precision NOT NULL CHECK ("quantity" > 0),
        "unit" varchar(8) NOT NULL CHECK ("unit" IN ('g', 'piece')),
        "piece_weight_g" double precision CHECK ("piece_weight_g" > 0),
        "note" varchar(200),
        PRIMARY KEY ("dessert_id", "position")
      )`);
    await queryRunner.query(
      `CREATE INDEX "IDX_dessert_components_recipe" ON "dessert_components" ("recipe_id")`,
    );

    await queryRunner.query(`
      CREATE TABLE "menus" (
        "id" varchar(36) PRIMARY KEY NOT NULL,
        "name" varchar(120) NOT NULL,
        "description" text,
        "price_per_guest_minor" integer NOT NULL CHECK ("price_per_guest_minor" >= 0),
        "min_guests" integer NOT NULL CHECK ("min_guests" >= 1),
        "max_guests" integer NOT NULL,
        "lead_days" integer NOT NULL CHECK ("lead_days" >= 0),
        "active" boolean NOT NULL CHECK ("active" IN (0, 1)),
        "photos" text NOT NULL DEFAULT ('[]'),
        "created_at" datetime NOT NULL DEFAULT (datetime('now')),
        "updated_at" datetime NOT NULL DEFAULT (datetime('now')),
        CHECK ("max_guests" >= "min_guests")
      )`);
    await queryRunner.query(`CREATE INDEX "IDX_menus_name" ON "menus" ("name")`);

    await queryRunner.query(`
      CREATE TABLE "menu_desserts" (
        "menu_id" varchar(36) NOT NULL REFERENCES "menus" ("id") ON DELETE CASCADE,
        "position" integer NOT NULL CHECK ("position" >= 0),
        "dessert_id" varchar(36) NOT NULL REFERENCES "desserts" ("id") ON DELETE RESTRICT,
        PRIMARY KEY ("menu_id", "position")
      )`);
    await queryRunner.query(
      `CREATE INDEX "IDX_menu_desserts_dessert" ON "menu_desserts" ("dessert_id")`,
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX "IDX_menu_desserts_dessert"`);
    await queryRunner.query(`DROP TABLE "menu_desserts"`);
    await queryRunner.query(`DROP INDEX "IDX_menus_name"`);
    await queryRunner.query(`DROP TABLE "menus"`);
    await queryRunner.query(`DROP INDEX "IDX_dessert_components_recipe"`);
    await queryRunner.query(`DROP TABLE "dessert_components"`);
    await queryRunner.query(`DROP INDEX "IDX_desserts_name"`);
    await queryRunner.query(`DROP TABLE "desserts"`);
    await queryRunner.query(`DROP INDEX "IDX_recipe_lines_sub_recipe"`);
    await queryRunner.query(`DROP INDEX "IDX_recipe_lines_ingredient"`);
    await queryRunner.query(`DROP TABLE "recipe_lines"`);
    await queryRunner.query(`DROP INDEX "IDX_recipes_name"`);
    await queryRunner.query(`DROP TABLE "recipes"`);
    await queryRunner.query(`DROP INDEX "IDX_ingredients_name"`);
    await queryRunner.query(`DROP TABLE "ingredients"`);
  }
}
