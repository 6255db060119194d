'use strict';

/** Accounts, teams and who holds which role on which team. */
module.exports = {
  async up(queryInterface, Sequelize) {
    await queryInterface.sequelize.transaction(async (transaction) => {
      const timestamps = {
        created_at: { type: Sequelize.DATE, allowNull: false, defaultValue: Sequelize.fn('now') },
        updated_at: { type: Sequelize.DATE, allowNull: false, defaultValue: Sequelize.fn('now') },
      };
      const id = { type: Sequelize.UUID, primaryKey: true, defaultValue: Sequelize.literal('gen_random_uuid()') };

      await queryInterface.createTable(
        'users',
        {
          id,
          email: { type: Sequelize.STRING(254), allowNull: false, unique: true },
          name: { type: Sequelize.STRING(120), allowNull: false },
          password_hash: { type: Sequelize.STRING(255), allowNull: false },
          // Bumped by sign-out and "sign out everywhere": tokens carrying an older value stop working.
          session_version: { type: Sequelize.INTEGER, allowNull: false, defaultValue: 0 },
          ...timestamps,
        },
        { transaction },
      );

      await queryInterface.createTable(
        'teams',
        {
          id,
          name: { type: Sequelize.STRING(120), allowNull: false },
          ...timestamps,
        },
        { transaction },
      );

      await queryInterface.createTable(
        'memberships',
        {
          id,
          team_id: {
            type: Sequelize.UUID,
            allowNull: false,
            references: { model: 'teams', key: 'id' },
            onDelete: 'CASCADE',
          },
          user_id: {
            type: Sequelize.UUID,
            allowNull: false,
            references: { model: 'users', key: 'id' },
            onDelete: 'CASCADE',
          },
          role: { type: Sequelize.STRING(16), allowNull: false },
          ...timestamps,
        },
        { transaction },
      );
      await queryInterface.addConstraint('memberships', {
        type: 'check',
        fields: ['role'],
        name: 'memberships_role_check',
        where: { role: ['owner', 'designer', 'surveyor', 'reviewer', 'viewer'] },
        transaction,
      });
      await queryInterface.addIndex('memberships', ['team_id', 'user_id'], { unique: true, transaction });
      await queryInterface.addIndex('memberships', ['user_id'], { transaction });
    });
  },

  async down(queryInterface) {
    await queryInterface.dropTable('memberships');
    await queryInterface.dropTable('teams');
    await queryInterface.dropTable('users');
  },
};
