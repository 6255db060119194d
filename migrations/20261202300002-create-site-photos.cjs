'use strict';

/**
 * Site photos: the cleaned image and its thumbnail in object storage, where and when it was taken, where it sits on a
 * route.
 */
module.exports = {
  async up(queryInterface, Sequelize) {
    await queryInterface.sequelize.transaction(async (transaction) => {
      await queryInterface.createTable(
        'site_photos',
        {
          id: { type: Sequelize.UUID, primaryKey: true, defaultValue: Sequelize.literal('gen_random_uuid()') },
          project_id: {
            type: Sequelize.UUID,
            allowNull: false,
            references: { model: 'projects', key: 'id' },
            onDelete: 'CASCADE',
          },
          file_name: { type: Sequelize.STRING(255), allowNull: false },
          content_type: { type: Sequelize.STRING(40), allowNull: false },
          size_bytes: { type: Sequelize.INTEGER, allowNull: false },
          width: { type: Sequelize.INTEGER, allowNull: false },
          height: { type: Sequelize.INTEGER, allowNull: false },
          image_key: { type: Sequelize.STRING(300), allowNull: false },
          thumbnail_key: { type: Sequelize.STRING(300), allowNull: false },
          taken_at: { type: Sequelize.DATE, allowNull: true },
          latitude: { type: Sequelize.DOUBLE, allowNull: true },
          longitude: { type: Sequelize.DOUBLE, allowNull: true },
          route_id: {
            type: Sequelize.UUID,
            allowNull: true,
            references: { model: 'routes', key: 'id' },
            onDelete: 'SET NULL',
          },
          chainage_m: { type: Sequelize.DOUBLE, allowNull: true },
          offset_m: { type: Sequelize.DOUBLE, allowNull: true },
          placement: { type: Sequelize.STRING(16), allowNull: false },
          caption: { type: Sequelize.STRING(500), allowNull: false, defaultValue: '' },
          in_report: { type: Sequelize.BOOLEAN, allowNull: false, defaultValue: false },
          uploaded_by: {
            type: Sequelize.UUID,
            allowNull: true,
            references: { model: 'users', key: 'id' },
            onDelete: 'SET NULL',
          },
          created_at: { type: Sequelize.DATE, allowNull: false, defaultValue: Sequelize.fn('now') },
          updated_at: { type: Sequelize.DATE, allowNull: false, defaultValue: Sequelize.fn('now') },
        },
        { transaction },
      );
      await queryInterface.addConstraint('site_photos', {
        type: 'check',
        fields: ['placement'],
        name: 'site_photos_placement_check',
        where: { placement: ['position', 'picked', 'unplaced'] },
        transaction,
      });
      await queryInterface.addIndex('site_photos', ['project_id'], { transaction });
      await queryInterface.addIndex('site_photos', ['route_id', 'chainage_m'], { transaction });
    });
  },

  async down(queryInterface) {
    await queryInterface.dropTable('site_photos');
  },
};
