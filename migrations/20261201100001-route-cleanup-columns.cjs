'use strict';

/**
 * What the survey screens need beyond the first route tables: where a route came from (file
 * format, sketch, join), its 3-D length, named features and import notes, and per point whether
 * an accepted clean-up took it out of the cleaned profile and which checks the user dismissed.
 * Excluded points stay in the table so raw and cleaned can be shown side by side.
 */
module.exports = {
  async up(queryInterface, Sequelize) {
    await queryInterface.sequelize.transaction(async (transaction) => {
      await queryInterface.addColumn(
        'routes',
        'source_format',
        { type: Sequelize.STRING(24), allowNull: true },
        { transaction },
      );
      await queryInterface.addColumn(
        'routes',
        'slope_length_m',
        { type: Sequelize.DOUBLE, allowNull: false, defaultValue: 0 },
        { transaction },
      );
      await queryInterface.addColumn(
        'routes',
        'features',
        { type: Sequelize.JSONB, allowNull: false, defaultValue: [] },
        { transaction },
      );
      await queryInterface.addColumn(
        'routes',
        'import_notes',
        { type: Sequelize.JSONB, allowNull: false, defaultValue: [] },
        { transaction },
      );
      await queryInterface.addColumn(
        'routes',
        'closure_error_m',
        { type: Sequelize.DOUBLE, allowNull: true },
        { transaction },
      );
      await queryInterface.addColumn(
        'route_points',
        'excluded',
        { type: Sequelize.BOOLEAN, allowNull: false, defaultValue: false },
        { transaction },
      );
      await queryInterface.addColumn(
        'route_points',
        'dismissed_checks',
        { type: Sequelize.ARRAY(Sequelize.STRING(24)), allowNull: false, defaultValue: [] },
        { transaction },
      );
      await queryInterface.addConstraint('routes', {
        type: 'check',
        fields: ['source_format'],
        name: 'routes_source_format_check',
        transaction,
        where: {
          source_format: [
            'gps-csv',
            'station-csv',
            'gpx',
            'inclinometer-csv',
            'level-book-csv',
            'sketch',
            'joined',
            'split',
            'typed',
          ],
        },
      });
    });
  },

  async down(queryInterface) {
    await queryInterface.sequelize.transaction(async (transaction) => {
      await queryInterface.removeConstraint('routes', 'routes_source_format_check', { transaction });
      for (const column of ['source_format', 'slope_length_m', 'features', 'import_notes', 'closure_error_m']) {
        await queryInterface.removeColumn('routes', column, { transaction });
      }
      await queryInterface.removeColumn('route_points', 'excluded', { transaction });
      await queryInterface.removeColumn('route_points', 'dismissed_checks', { transaction });
    });
  },
};
