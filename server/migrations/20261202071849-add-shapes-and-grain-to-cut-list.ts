import { DataTypes, type QueryInterface } from 'sequelize';

const SHAPES = ['rect', 'circle', 'oval', 'rounded-rect', 'scalloped-rect', 'scalloped-circle', 'tag', 'pillow-box'];

/**
 * Shapes beyond rectangles and circles, with their own sizes (exact lengths as text in a JSON
 * object: "1/4 in", never floats); the grain each piece needs and the grain of each material's
 * stock sheet. Existing wrap strips and walls take the grain along their length, the default a
 * new one gets (a wall bends cleanly only with the grain running round it; common practice).
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.addColumn('pieces', 'params', { type: DataTypes.JSONB, allowNull: false, defaultValue: {} });
  await qi.addColumn('pieces', 'grain', { type: DataTypes.TEXT, allowNull: false, defaultValue: 'any' });
  await qi.addColumn('materials', 'grain', { type: DataTypes.TEXT, allowNull: false, defaultValue: 'none' });
  await qi.sequelize.query(`ALTER TABLE pieces DROP CONSTRAINT pieces_shape`);
  await qi.sequelize.query(`ALTER TABLE pieces ADD CONSTRAINT pieces_shape CHECK (shape IN (${SHAPES.map((s) => `'${s}'`).join(',')}))`);
  await qi.sequelize.query(`ALTER TABLE pieces ADD CONSTRAINT pieces_grain CHECK (grain IN ('length','width','any'))`);
  await qi.sequelize.query(`ALTER TABLE materials ADD CONSTRAINT materials_grain CHECK (grain IN ('height','width','none'))`);
  await qi.sequelize.query(`UPDATE pieces SET grain = 'length' WHERE shape = 'rect' AND name ~* '\\m(strip|wall|band|rim|wrap)'`);
}

export async function down({ context: qi }: { context: QueryInterface }) {
  // Shapes the old list does not know go back to their bounding rectangle, circles kept.
  await qi.sequelize.query(`UPDATE pieces SET shape = CASE WHEN shape IN ('circle','scalloped-circle') THEN 'circle' ELSE 'rect' END`);
  await qi.sequelize.query(`ALTER TABLE materials DROP CONSTRAINT materials_grain`);
  await qi.sequelize.query(`ALTER TABLE pieces DROP CONSTRAINT pieces_grain`);
  await qi.sequelize.query(`ALTER TABLE pieces DROP CONSTRAINT pieces_shape`);
  await qi.sequelize.query(`ALTER TABLE pieces ADD CONSTRAINT pieces_shape CHECK (shape IN ('rect','circle'))`);
  await qi.removeColumn('materials', 'grain');
  await qi.removeColumn('pieces', 'grain');
  await qi.removeColumn('pieces', 'params');
}
