import type { MigrationInterface, QueryRunner } from 'typeorm';

/** PostgreSQL twin of `../1764720000000-kitchen-catalogue.ts` (see there for the why). */
export class KitchenCatalogue1764720000000 implements MigrationInterface {
  name = 'KitchenCatalogue1764720000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE "ingredients" (
        "id" varchar(36) PRIMARY KEY NOT NULL,
        "name" varchar(120) NOT NULL,
        "label_name" varchar(300),
        "pack_size" double precision NOT NULL,
        "pack_unit" varchar(16) NOT NULL,
        "pack_price_minor" integer NOT NULL,
        "density_g_per_ml" double precision,
        "unit_weight_g" double precision,
        "count_unit" varchar(8),
        "allergens" text NOT NULL,
        "dietary" text NOT NULL,
        "composition" text,
        "notes" text,
        "created_at" timestamptz NOT NULL DEFAULT now(),
        "updated_at" timestamptz NOT NULL DEFAULT now(),
        CONSTRAINT "CHK_ingredients_pack_size" CHECK ("pack_size" > 0),
        CONSTRAINT "CHK_ingredients_pack_price" CHECK ("pack_price_minor" >= 0),
        CONSTRAINT "CHK_ingredients_density" CHECK ("density_g_per_ml" > 0),
        CONSTRAINT "CHK_ingredients_unit_weight" CHECK ("unit_weight_g" > 0),
        CONSTRAINT "CHK_ingredients_count_unit" CHECK ("count_unit" IN ('piece', 'leaf'))
      )`);
    await queryRunner.query(`CREATE INDEX "IDX_ingredients_name" ON "ingredients" ("name")`);

    await queryRunner.query(`
      CREATE TABLE "recipes" (
        "id" varchar(36) PRIMARY KEY NOT NULL,
        "name" varchar(120) NOT NULL,
        "yield_g" double precision NOT NULL,
        "storage" varchar(8) NOT NULL,
        "shelf_life_hours" double precision NOT NULL,
        "steps" text NOT NULL,
        "equipment" text,
        "density_g_per_ml" double precision,
        "unit_weight_g" double precision,
        "notes" text,
        "created_at" timestamptz NOT NULL DEFAULT now(),
        "updated_at" timestamptz NOT NULL DEFAULT now(),
        CONSTRAINT "CHK_recipes_yield" CHECK ("yield_g" > 0),
        CONSTRAINT "CHK_recipes_storage" CHECK ("storage" IN ('dry', 'chilled', 'frozen')),
        CONSTRAINT "CHK_recipes_shelf_life" CHECK ("shelf_life_hours" > 0),
        CONSTRAINT "CHK_recipes_density" CHECK ("density_g_per_ml" > 0),
        CONSTRAINT "CHK_recipes_unit_weight" CHECK ("unit_weight_g" > 0)
      )`);
    await queryRunner.query(`CREATE INDEX "IDX_recipes_name" ON "recipes" ("name")`);

    // A line is an ingredient or a sub-recipe, never both, never the recipe itself.
    await queryRunner.query(`
      CREATE TABLE "recipe_lines" (
        "recipe_id" varchar(36) NOT NULL,
        "position" integer NOT NULL,
        "ingredient_id" varchar(36),
        "sub_recipe_id" varchar(36),
        "quantity" double precision NOT NULL,
        "unit" varchar(16) NOT NULL,
        "note" varchar(200),
        PRIMARY KEY ("recipe_id", "position"),
        CONSTRAINT "FK_9c318ef7b0154352e840ed16e2b" FOREIGN KEY ("recipe_id") REFERENCES "recipes" ("id") ON DELETE CASCADE,
        CONSTRAINT "FK_c839293d78db4ae733d75f502f5" FOREIGN KEY ("ingredient_id") REFERENCES "ingredients" ("id") ON DELETE RESTRICT,
        CONSTRAINT "FK_c1417200603f4a3424b780db6dd" FOREIGN KEY ("sub_recipe_id") REFERENCES "recipes" ("id") ON DELETE RESTRICT,
        CONSTRAINT "CHK_recipe_lines_position" CHECK ("position" >= 0),
        CONSTRAINT "CHK_recipe_lines_quantity" CHECK ("quantity" > 0),
        CONSTRAINT "CHK_recipe_lines_one_source" CHECK (("ingredient_id" IS NULL) <> ("sub_recipe_id" IS NULL)),
        CONSTRAINT "CHK_recipe_lines_not_itself" CHECK ("sub_recipe_id" IS NULL OR "sub_recipe_id" <> "recipe_id")
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
        "photos" text NOT NULL DEFAULT '[]',
        "created_at" timestamptz NOT NULL DEFAULT now(),
        "updated_at" timestamptz NOT NULL DEFAULT now()
      )`);
    await queryRunner.query(`CREATE INDEX "IDX_desserts_name" ON "desserts" ("name")`);

    await queryRunner.query(`
      CREATE TABLE "dessert_components" (
        "dessert_id" varchar(36) NOT NULL,
        "position" integer NOT NULL,
        "recipe_id" varchar(36) NOT NULL,
        "quantity" double precision NOT NULL,
        "unit" varchar(8) NOT NULL,
        "piece_weight_g" double precision,
        "note" varchar(200),
        PRIMARY KEY ("dessert_id", "position"),
        CONSTRAINT "FK_f78193f4e8ba1722d83cf187559" FOREIGN KEY ("dessert_id") REFERENCES "desserts" ("id") ON DELETE CASCADE,
        CONSTRAINT "FK_367d58282d6a3f964742081cab3" FOREIGN KEY ("recipe_id") REFERENCES "recipes" ("id") ON DELETE RESTRICT,
        CONSTRAINT "CHK_dessert_components_position" CHECK ("position" >= 0),
        CONSTRAINT "CHK_dessert_components_quantity" CHECK ("quantity" > 0),
        CONSTRAINT "CHK_dessert_components_unit" CHECK ("unit" IN ('g', 'piece')),
        CONSTRAINT "CHK_dessert_components_piece_weight" CHECK ("piece_weight_g" > 0)
      )`);
    await queryRunner.query(
      `CREATE INDEX "IDX_dessert_components_recipe" ON "dessert_components" ("recipe_id")`,
    );

    await queryRunner.query(`
      CREATE TABLE "menus" (
        "id" varchar(36) PRIMARY KEY NOT NULL,
        "name" varchar(120) NOT NULL,
        "description" text,
        "price_per_guest_minor" integer NOT NULL,
        "min_guests" integer NOT NULL,
        "max_guests" integer NOT NULL,
        "lead_days" integer NOT NULL,
        "active" boolean NOT NULL,
        "photos" text NOT NULL DEFAULT '[]',
        "created_at" timestamptz NOT NULL DEFAULT now(),
        "updated_at" timestamptz NOT NULL DEFAULT now(),
        CONSTRAINT "CHK_menus_price" CHECK ("price_per_guest_minor" >= 0),
        CONSTRAINT "CHK_menus_min_guests" CHECK ("min_guests" >= 1),
        CONSTRAINT "CHK_menus_lead_days" CHECK ("lead_days" >= 0),
        CONSTRAINT "CHK_menus_guest_range" CHECK ("max_guests" >= "min_guests")
      )`);
    await queryRunner.query(`CREATE INDEX "IDX_menus_name" ON "menus" ("name")`);

    await queryRunner.query(`
      CREATE TABLE "menu_desserts" (
        "menu_id" varchar(36) NOT NULL,
        "position" integer NOT NULL,
        "dessert_id" varchar(36) NOT NULL,
        PRIMARY KEY ("menu_id", "position"),
        CONSTRAINT "FK_03102644f3278242665d5bcb5c4" FOREIGN KEY ("menu_id") REFERENCES "menus" ("id") ON DELETE CASCADE,
        CONSTRAINT "FK_1e250b5b7d955c436260eb8b69d" FOREIGN KEY ("dessert_id") REFERENCES "desserts" ("id") ON DELETE RESTRICT,
        CONSTRAINT "CHK_menu_desserts_position" CHECK ("position" >= 0)
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
