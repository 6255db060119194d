'use strict';

/**
 * Joins a project's saved lines, ram sites, tanks and demand uses into its network, keeping every
 * row. Used by the migration that creates the network tables (users' projects), by the demo seed
 * (the seeders run after the migrations) and by the line writes (a new line becomes a link). Plain
 * SQL on a Sequelize instance so the migration does not depend on the app's models.
 *
 * What a line becomes: a link from its start node (a ram site's outlet node, or a source node at
 * the line's water level or typed pump head) to its end node (the feeding ram's tank when the line
 * discharges into a tank, else an outlet node). An outlet made from a line with a design flow draws
 * that flow as a fixed demand, so the line's analysis is the same as before the network existed.
 */

async function rows(sequelize, transaction, sql, replacements = {}) {
  const [result] = await sequelize.query(sql, { replacements, transaction });
  return result;
}

async function insertNode(sequelize, transaction, node) {
  const [created] = await rows(
    sequelize,
    transaction,
    `
    INSERT INTO network_nodes (project_id, kind, name, elevation_m, water_source_id, ram_site_id, tank_id, line_id, chainage_m, data, notes)
    VALUES (:projectId, :kind, :name, :elevationM, :waterSourceId, :ramSiteId, :tankId, :lineId, :chainageM, CAST(:data AS jsonb), :notes)
    RETURNING id`,
    {
      projectId: node.projectId,
      kind: node.kind,
      name: String(node.name).slice(0, 120),
      elevationM: node.elevationM ?? null,
      waterSourceId: node.waterSourceId ?? null,
      ramSiteId: node.ramSiteId ?? null,
      tankId: node.tankId ?? null,
      lineId: node.lineId ?? null,
      chainageM: node.chainageM ?? null,
      data: JSON.stringify(node.data ?? {}),
      notes: node.notes ?? '',
    },
  );
  return created.id;
}

async function ramNode(sequelize, transaction, projectId, ramSiteId) {
  const existing = await rows(sequelize, transaction, 'SELECT id FROM network_nodes WHERE ram_site_id = :ramSiteId', {
    ramSiteId,
  });
  if (existing.length > 0) return existing[0].id;
  const [site] = await rows(
    sequelize,
    transaction,
    'SELECT name, pump_elevation_m FROM ram_sites WHERE id = :ramSiteId AND project_id = :projectId',
    { ramSiteId, projectId },
  );
  if (!site) return null;
  return insertNode(sequelize, transaction, {
    projectId,
    kind: 'ram-outlet',
    name: `${site.name} outlet`,
    elevationM: site.pump_elevation_m,
    ramSiteId,
    data: {},
  });
}

async function tankNode(sequelize, transaction, projectId, tankId) {
  const existing = await rows(sequelize, transaction, 'SELECT id FROM network_nodes WHERE tank_id = :tankId', {
    tankId,
  });
  if (existing.length > 0) return existing[0].id;
  const [tank] = await rows(
    sequelize,
    transaction,
    'SELECT name, base_elevation_m FROM tanks WHERE id = :tankId AND project_id = :projectId',
    { tankId, projectId },
  );
  if (!tank) return null;
  return insertNode(sequelize, transaction, {
    projectId,
    kind: 'tank',
    name: tank.name,
    elevationM: tank.base_elevation_m,
    tankId,
    data: { inletFloatValve: true },
  });
}

function parse(value) {
  return typeof value === 'string' ? JSON.parse(value) : value;
}

async function startNodeOf(sequelize, transaction, line) {
  const start = parse(line.start_condition);
  if (start.kind === 'ram-site') {
    const id = await ramNode(sequelize, transaction, line.project_id, start.ramSiteId);
    if (id) return { id, ramSiteId: start.ramSiteId };
  }
  if (start.kind === 'pump') {
    return {
      id: await insertNode(sequelize, transaction, {
        projectId: line.project_id,
        kind: 'source',
        name: `${line.name}: pump outlet`,
        elevationM: start.outletHeadM,
        data: {
          // No shut-off head typed: the line analysis's own default applies (it is not the outlet head).
          waterLevelM: start.outletHeadM,
          typedPumpHead: {
            outletHeadM: start.outletHeadM,
            ...(start.shutoffHeadM !== undefined ? { shutoffHeadM: start.shutoffHeadM } : {}),
          },
        },
        notes:
          'Typed pump heads taken from the line. Point the line at its ram site to read the heads from the ram plan.',
      }),
      ramSiteId: null,
    };
  }
  const levelM = start.kind === 'water-level' ? start.levelM : null;
  return {
    id: await insertNode(sequelize, transaction, {
      projectId: line.project_id,
      kind: 'source',
      name: `${line.name}: intake`,
      elevationM: levelM,
      data: { waterLevelM: levelM },
    }),
    ramSiteId: null,
  };
}

async function endNodeOf(sequelize, transaction, line, ramSiteId) {
  const end = parse(line.end_condition);
  const flow = parse(line.flow);
  const fixedDemandM3s = flow.kind === 'design' ? flow.flowM3s : null;
  if (end.kind === 'tank-inlet' && ramSiteId) {
    const [site] = await rows(sequelize, transaction, 'SELECT tank_id FROM ram_sites WHERE id = :ramSiteId', {
      ramSiteId,
    });
    if (site && site.tank_id) {
      const id = await tankNode(sequelize, transaction, line.project_id, site.tank_id);
      if (id) return id;
    }
  }
  const outletKind = end.kind === 'outlet' ? 'tap' : end.kind === 'tank-inlet' ? 'tank-inlet' : 'free';
  return insertNode(sequelize, transaction, {
    projectId: line.project_id,
    kind: 'outlet',
    name: `${line.name}: end`,
    elevationM: end.kind === 'free-discharge' ? null : end.elevationM,
    data: {
      outletKind,
      residualHeadM: end.kind === 'outlet' ? (end.residualHeadM ?? null) : 0,
      demandFrom: fixedDemandM3s === null ? 'line' : 'fixed',
      fixedDemandM3s,
    },
  });
}

/** Adds one saved line to its project's network (once): start node, end node and the line link. */
async function linkLineIntoNetwork(sequelize, transaction, lineId) {
  const [line] = await rows(sequelize, transaction, 'SELECT * FROM lines WHERE id = :lineId', { lineId });
  if (!line) return null;
  const existing = await rows(sequelize, transaction, 'SELECT id FROM network_links WHERE line_id = :lineId', {
    lineId,
  });
  if (existing.length > 0) return existing[0].id;
  const start = await startNodeOf(sequelize, transaction, line);
  const endId = await endNodeOf(sequelize, transaction, line, start.ramSiteId);
  const [link] = await rows(
    sequelize,
    transaction,
    `
    INSERT INTO network_links (project_id, kind, name, from_node_id, to_node_id, line_id, data)
    VALUES (:projectId, 'line', :name, :fromId, :toId, :lineId, '{}'::jsonb) RETURNING id`,
    {
      projectId: line.project_id,
      name: String(line.name).slice(0, 120),
      fromId: start.id,
      toId: endId,
      lineId,
    },
  );
  return link.id;
}

/**
 * After a line's start changes, its link starts from the node the new start names: the ram site's
 * outlet node, or a source. A source that only this line joins (and no water source record names)
 * is the line's own: it follows the new water level or typed pump head in place. Any other start
 * node gets a new node, and the old one goes when it was the line's own and nothing joins it now.
 */
async function rejoinLineStart(sequelize, transaction, lineId) {
  const [line] = await rows(sequelize, transaction, 'SELECT * FROM lines WHERE id = :lineId', { lineId });
  if (!line) return null;
  const [link] = await rows(
    sequelize,
    transaction,
    'SELECT id, from_node_id FROM network_links WHERE line_id = :lineId',
    { lineId },
  );
  if (!link) return linkLineIntoNetwork(sequelize, transaction, lineId);
  const start = parse(line.start_condition);
  const [current] = await rows(
    sequelize,
    transaction,
    'SELECT id, kind, ram_site_id, water_source_id FROM network_nodes WHERE id = :id',
    { id: link.from_node_id },
  );
  if (start.kind === 'ram-site' && current && current.ram_site_id === start.ramSiteId) return link.id;
  if (start.kind !== 'ram-site' && current && current.kind === 'source') {
    const others = await rows(
      sequelize,
      transaction,
      'SELECT 1 FROM network_links WHERE (from_node_id = :id OR to_node_id = :id) AND id <> :linkId LIMIT 1',
      { id: current.id, linkId: link.id },
    );
    if (others.length === 0 && !current.water_source_id) {
      const levelM = start.kind === 'water-level' ? start.levelM : start.kind === 'pump' ? start.outletHeadM : null;
      const data =
        start.kind === 'pump'
          ? {
              waterLevelM: levelM,
              typedPumpHead: {
                outletHeadM: start.outletHeadM,
                ...(start.shutoffHeadM !== undefined ? { shutoffHeadM: start.shutoffHeadM } : {}),
              },
            }
          : { waterLevelM: levelM };
      await rows(
        sequelize,
        transaction,
        'UPDATE network_nodes SET elevation_m = :levelM, data = CAST(:data AS jsonb), updated_at = now() WHERE id = :id',
        { id: current.id, levelM, data: JSON.stringify(data) },
      );
    }
    return link.id;
  }
  const next = await startNodeOf(sequelize, transaction, line);
  await rows(
    sequelize,
    transaction,
    'UPDATE network_links SET from_node_id = :fromId, updated_at = now() WHERE id = :linkId',
    { fromId: next.id, linkId: link.id },
  );
  await rows(
    sequelize,
    transaction,
    `
    DELETE FROM network_nodes n WHERE n.id = :id AND n.kind IN ('source', 'junction', 'outlet')
      AND n.water_source_id IS NULL AND n.ram_site_id IS NULL AND n.tank_id IS NULL
      AND NOT EXISTS (SELECT 1 FROM network_links l WHERE l.from_node_id = n.id OR l.to_node_id = n.id)
      AND NOT EXISTS (SELECT 1 FROM demand_uses d WHERE d.outlet_node_id = n.id)`,
    { id: link.from_node_id },
  );
  return link.id;
}

/** One project's network from its records; a project that already has nodes is left as it is. */
async function buildNetworkOfProject(sequelize, transaction, projectId) {
  const already = await rows(
    sequelize,
    transaction,
    'SELECT 1 FROM network_nodes WHERE project_id = :projectId LIMIT 1',
    { projectId },
  );
  if (already.length > 0) return false;
  const lines = await rows(
    sequelize,
    transaction,
    'SELECT id FROM lines WHERE project_id = :projectId ORDER BY created_at, id',
    { projectId },
  );
  for (const line of lines) await linkLineIntoNetwork(sequelize, transaction, line.id);

  for (const tank of await rows(
    sequelize,
    transaction,
    'SELECT id FROM tanks WHERE project_id = :projectId ORDER BY created_at, id',
    { projectId },
  )) {
    await tankNode(sequelize, transaction, projectId, tank.id);
  }
  // A ram site without a delivery line still delivers into its tank: its delivery pipe becomes a typed pipe link.
  const sites = await rows(
    sequelize,
    transaction,
    'SELECT * FROM ram_sites WHERE project_id = :projectId ORDER BY created_at, id',
    { projectId },
  );
  for (const site of sites) {
    const ramId = await ramNode(sequelize, transaction, projectId, site.id);
    const fed = await rows(sequelize, transaction, 'SELECT 1 FROM network_links WHERE from_node_id = :ramId LIMIT 1', {
      ramId,
    });
    if (fed.length > 0 || !site.tank_id) continue;
    const tankId = await tankNode(sequelize, transaction, projectId, site.tank_id);
    await rows(
      sequelize,
      transaction,
      `
      INSERT INTO network_links (project_id, kind, name, from_node_id, to_node_id, data)
      VALUES (:projectId, 'pipe', :name, :fromId, :toId, CAST(:data AS jsonb))`,
      {
        projectId,
        name: `${site.name} delivery pipe`.slice(0, 120),
        fromId: ramId,
        toId: tankId,
        data: JSON.stringify({
          lengthM: site.delivery_length_m,
          pipe: site.delivery_pipe_id ?? null,
          insideDiameterM: site.delivery_inside_diameter_m,
          hazenC: site.delivery_hazen_c,
          minorK: 0,
        }),
      },
    );
  }

  const uses = await rows(
    sequelize,
    transaction,
    'SELECT id FROM demand_uses WHERE project_id = :projectId AND outlet_node_id IS NULL',
    { projectId },
  );
  if (uses.length > 0) {
    const [outlet] = await rows(
      sequelize,
      transaction,
      `
      SELECT n.id FROM network_nodes n JOIN network_links l ON l.to_node_id = n.id
      WHERE n.project_id = :projectId AND n.kind = 'outlet' AND n.data->>'outletKind' NOT IN ('tank-inlet', 'free') ORDER BY l.created_at, l.id LIMIT 1`,
      { projectId },
    );
    if (outlet) {
      await rows(
        sequelize,
        transaction,
        'UPDATE demand_uses SET outlet_node_id = :outletId WHERE project_id = :projectId AND outlet_node_id IS NULL',
        { outletId: outlet.id, projectId },
      );
      await rows(sequelize, transaction, `UPDATE network_nodes SET notes = :note WHERE id = :outletId`, {
        outletId: outlet.id,
        note: `The project's ${uses.length} demand use(s) could not be tied to the outlets they serve, so they were tied to this line end. Move each use to its outlet; this outlet keeps its line's design flow until you switch it to draw from its uses.`,
      });
    } else {
      const [tank] = await rows(
        sequelize,
        transaction,
        "SELECT id FROM network_nodes WHERE project_id = :projectId AND kind = 'tank' ORDER BY created_at LIMIT 1",
        { projectId },
      );
      if (tank) {
        await rows(sequelize, transaction, 'UPDATE network_nodes SET notes = :note WHERE id = :id', {
          id: tank.id,
          note: `The project's ${uses.length} demand use(s) are not tied to an outlet yet: add the outlets this tank feeds and tie each use to its outlet.`,
        });
      }
    }
  }
  return true;
}

/** Every project's network (or the listed projects'), for projects that have none yet. */
async function buildNetworksFromRecords(sequelize, transaction, projectIds) {
  const projects = projectIds
    ? projectIds.map((id) => ({ id }))
    : await rows(sequelize, transaction, 'SELECT id FROM projects ORDER BY created_at, id');
  let built = 0;
  for (const project of projects) if (await buildNetworkOfProject(sequelize, transaction, project.id)) built += 1;
  return built;
}

module.exports = { buildNetworksFromRecords, buildNetworkOfProject, linkLineIntoNetwork, rejoinLineStart };
