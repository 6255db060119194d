'use strict';

/**
 * Route points keep to their route through three triggers instead of a foreign key. A foreign key checks each
 * inserted row on its own (one look-up per row), which was most of the database's time when a 100,000-fix walk is
 * imported; the statement trigger checks each route once per statement. The guarantees stay those of the key:
 * - points may only be written for a route that exists, and the route is locked (FOR KEY SHARE, as the key's own
 *   check locks it) so a delete running beside the insert waits for it or makes it fail;
 * - deleting a route deletes its points (the key's ON DELETE CASCADE), also when a project's deletion removes it;
 * - a point never moves to another route, and a route's id never changes (the key refused both).
 * The failure keeps the key's error code (23503, foreign_key_violation).
 */
const UP = `
CREATE FUNCTION route_points_check_routes() RETURNS trigger LANGUAGE plpgsql AS $$
DECLARE
  missing uuid;
BEGIN
  PERFORM 1 FROM routes WHERE id IN (SELECT DISTINCT route_id FROM written_points) FOR KEY SHARE;
  SELECT p.route_id INTO missing
    FROM (SELECT DISTINCT route_id FROM written_points) p
   WHERE NOT EXISTS (SELECT 1 FROM routes r WHERE r.id = p.route_id)
   LIMIT 1;
  IF FOUND THEN
    RAISE EXCEPTION 'route_points: route % does not exist', missing
      USING ERRCODE = 'foreign_key_violation', TABLE = 'route_points', COLUMN = 'route_id';
  END IF;
  RETURN NULL;
END $$;

CREATE TRIGGER route_points_route_exists AFTER INSERT ON route_points
  REFERENCING NEW TABLE AS written_points FOR EACH STATEMENT EXECUTE FUNCTION route_points_check_routes();

CREATE FUNCTION refuse_key_change() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  RAISE EXCEPTION '%: % may not change', TG_TABLE_NAME, TG_ARGV[0]
    USING ERRCODE = 'foreign_key_violation', TABLE = TG_TABLE_NAME, COLUMN = TG_ARGV[0];
END $$;

CREATE TRIGGER route_points_stay_on_route BEFORE UPDATE OF route_id ON route_points
  FOR EACH ROW WHEN (OLD.route_id IS DISTINCT FROM NEW.route_id) EXECUTE FUNCTION refuse_key_change('route_id');

CREATE TRIGGER routes_keep_id BEFORE UPDATE OF id ON routes
  FOR EACH ROW WHEN (OLD.id IS DISTINCT FROM NEW.id) EXECUTE FUNCTION refuse_key_change('id');

CREATE FUNCTION routes_delete_points() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  DELETE FROM route_points WHERE route_id IN (SELECT id FROM gone_routes);
  RETURN NULL;
END $$;

CREATE TRIGGER routes_delete_points AFTER DELETE ON routes
  REFERENCING OLD TABLE AS gone_routes FOR EACH STATEMENT EXECUTE FUNCTION routes_delete_points();

ALTER TABLE route_points DROP CONSTRAINT route_points_route_id_fkey;
`;

const DOWN = `
ALTER TABLE route_points ADD CONSTRAINT route_points_route_id_fkey
  FOREIGN KEY (route_id) REFERENCES routes(id) ON DELETE CASCADE;
DROP TRIGGER routes_delete_points ON routes;
DROP FUNCTION routes_delete_points();
DROP TRIGGER routes_keep_id ON routes;
DROP TRIGGER route_points_stay_on_route ON route_points;
DROP FUNCTION refuse_key_change();
DROP TRIGGER route_points_route_exists ON route_points;
DROP FUNCTION route_points_check_routes();
`;

module.exports = {
  async up(queryInterface) {
    await queryInterface.sequelize.transaction((transaction) => queryInterface.sequelize.query(UP, { transaction }));
  },

  async down(queryInterface) {
    await queryInterface.sequelize.transaction((transaction) => queryInterface.sequelize.query(DOWN, { transaction }));
  },
};
