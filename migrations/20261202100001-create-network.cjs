'use strict';

const { buildNetworksFromRecords } = require('./support/network-from-records.cjs');

/**
 * The project's water system as one network: nodes (source, ram pump outlet, storage tank,
 * break-pressure tank, take-off junction, outlet) and links (a line, a typed pipe, a valve) per
 * project, demand uses tied to the outlet they serve, a team price list for least-cost sizing and
 * network jobs (solve, day run, sizing) that run off the request thread and keep their progress
 * here so any app instance can answer a poll. SI throughout. Existing lines, ram sites, tanks and
 * demand uses are kept and joined into one network per project.
 */
module.exports = {
  async up(queryInterface, Sequelize) {
    await queryInterface.sequelize.transaction(async (transaction) => {
      const now = { type: Sequelize.DATE, allowNull: false, defaultValue: Sequelize.fn('now') };
      const id = { type: Sequelize.UUID, primaryKey: true, defaultValue: Sequelize.literal('gen_random_uuid()') };
      const project = {
        type: Sequelize.UUID,
        allowNull: false,
        references: { model: 'projects', key: 'id' },
        onDelete: 'CASCADE',
      };
      await queryInterface.createTable(
        'network_nodes',
        {
          id,
          project_id: project,
          kind: { type: Sequelize.STRING(24), allowNull: false },
          name: { type: Sequelize.STRING(120), allowNull: false },
          // Ground (or floor, or outlet) elevation above the survey datum; null where a record or route gives it.
          elevation_m: { type: Sequelize.DOUBLE, allowNull: true },
          water_source_id: {
            type: Sequelize.UUID,
            allowNull: true,
            references: { model: 'water_sources', key: 'id' },
            onDelete: 'SET NULL',
          },
          ram_site_id: {
            type: Sequelize.UUID,
            allowNull: true,
            references: { model: 'ram_sites', key: 'id' },
            onDelete: 'CASCADE',
          },
          tank_id: {
            type: Sequelize.UUID,
            allowNull: true,
            references: { model: 'tanks', key: 'id' },
            onDelete: 'CASCADE',
          },
          // A take-off: the line it sits on and the route chainage of the tee.
          line_id: {
            type: Sequelize.UUID,
            allowNull: true,
            references: { model: 'lines', key: 'id' },
            onDelete: 'CASCADE',
          },
          chainage_m: { type: Sequelize.DOUBLE, allowNull: true },
          // Where the schematic draws the node, m east/north of the project's first surveyed point; null = laid out
          // automatically.
          east_m: { type: Sequelize.DOUBLE, allowNull: true },
          north_m: { type: Sequelize.DOUBLE, allowNull: true },
          data: { type: Sequelize.JSONB, allowNull: false, defaultValue: {} },
          notes: { type: Sequelize.TEXT, allowNull: false, defaultValue: '' },
          created_at: now,
          updated_at: now,
        },
        { transaction },
      );
      await queryInterface.addIndex('network_nodes', ['project_id'], { transaction });
      await queryInterface.addConstraint('network_nodes', {
        type: 'check',
        fields: ['kind'],
        name: 'network_nodes_kind_check',
        transaction,
        where: { kind: ['source', 'ram-outlet', 'tank', 'break-pressure-tank', 'junction', 'outlet'] },
      });
      // One node per ram site and per tank record.
      await queryInterface.addIndex('network_nodes', ['ram_site_id'], {
        unique: true,
        where: { ram_site_id: { [Sequelize.Op.ne]: null } },
        transaction,
      });
      await queryInterface.addIndex('network_nodes', ['tank_id'], {
        unique: true,
        where: { tank_id: { [Sequelize.Op.ne]: null } },
        transaction,
      });

      await queryInterface.createTable(
        'network_links',
        {
          id,
          project_id: project,
          kind: { type: Sequelize.STRING(16), allowNull: false },
          name: { type: Sequelize.STRING(120), allowNull: false },
          from_node_id: {
            type: Sequelize.UUID,
            allowNull: false,
            references: { model: 'network_nodes', key: 'id' },
            onDelete: 'CASCADE',
          },
          to_node_id: {
            type: Sequelize.UUID,
            allowNull: false,
            references: { model: 'network_nodes', key: 'id' },
            onDelete: 'CASCADE',
          },
          // A line link follows the whole line; take-offs on it split it into pieces when the network is built.
          line_id: {
            type: Sequelize.UUID,
            allowNull: true,
            references: { model: 'lines', key: 'id' },
            onDelete: 'CASCADE',
          },
          data: { type: Sequelize.JSONB, allowNull: false, defaultValue: {} },
          created_at: now,
          updated_at: now,
        },
        { transaction },
      );
      await queryInterface.addIndex('network_links', ['project_id'], { transaction });
      await queryInterface.addIndex('network_links', ['line_id'], {
        unique: true,
        where: { line_id: { [Sequelize.Op.ne]: null } },
        transaction,
      });
      await queryInterface.addConstraint('network_links', {
        type: 'check',
        fields: ['kind'],
        name: 'network_links_kind_check',
        transaction,
        where: { kind: ['line', 'pipe', 'valve'] },
      });

      await queryInterface.addColumn(
        'demand_uses',
        'outlet_node_id',
        {
          type: Sequelize.UUID,
          allowNull: true,
          references: { model: 'network_nodes', key: 'id' },
          onDelete: 'SET NULL',
        },
        { transaction },
      );

      await queryInterface.createTable(
        'price_list_items',
        {
          id,
          team_id: {
            type: Sequelize.UUID,
            allowNull: false,
            references: { model: 'teams', key: 'id' },
            onDelete: 'CASCADE',
          },
          pipe_id: { type: Sequelize.STRING(80), allowNull: false },
          cost_per_m: { type: Sequelize.DOUBLE, allowNull: false },
          notes: { type: Sequelize.TEXT, allowNull: false, defaultValue: '' },
          created_at: now,
          updated_at: now,
        },
        { transaction },
      );
      await queryInterface.addIndex('price_list_items', ['team_id', 'pipe_id'], { unique: true, transaction });
      await queryInterface.addConstraint('price_list_items', {
        type: 'check',
        fields: ['cost_per_m'],
        name: 'price_list_items_cost_check',
        transaction,
        where: { cost_per_m: { [Sequelize.Op.gte]: 0 } },
      });

      await queryInterface.createTable(
        'network_jobs',
        {
          id,
          project_id: project,
          kind: { type: Sequelize.STRING(16), allowNull: false },
          status: { type: Sequelize.STRING(16), allowNull: false, defaultValue: 'queued' },
          progress: { type: Sequelize.DOUBLE, allowNull: false, defaultValue: 0 },
          stage: { type: Sequelize.STRING(200), allowNull: false, defaultValue: '' },
          options: { type: Sequelize.JSONB, allowNull: false, defaultValue: {} },
          result: { type: Sequelize.JSONB, allowNull: true },
          error: { type: Sequelize.JSONB, allowNull: true },
          created_by: {
            type: Sequelize.UUID,
            allowNull: true,
            references: { model: 'users', key: 'id' },
            onDelete: 'SET NULL',
          },
          started_at: { type: Sequelize.DATE, allowNull: true },
          finished_at: { type: Sequelize.DATE, allowNull: true },
          created_at: now,
          updated_at: now,
        },
        { transaction },
      );
      await queryInterface.addIndex('network_jobs', ['project_id', 'kind', 'created_at'], { transaction });

      await buildNetworksFromRecords(queryInterface.sequelize, transaction);
    });
  },

  async down(queryInterface) {
    await queryInterface.sequelize.transaction(async (transaction) => {
      await queryInterface.dropTable('network_jobs', { transaction });
      await queryInterface.dropTable('price_list_items', { transaction });
      await queryInterface.removeColumn('demand_uses', 'outlet_node_id', { transaction });
      await queryInterface.dropTable('network_links', { transaction });
      await queryInterface.dropTable('network_nodes', { transaction });
    });
  },
};
