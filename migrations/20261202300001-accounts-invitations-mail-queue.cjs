'use strict';

const { runMigrations } = require('graphile-worker');
const dbConfig = require('../lib/db-config.cjs');

/**
 * Verified addresses, single-use account tokens (sign-up, password reset), invitations, the mail
 * outbox, notification preferences, and the job queue's own schema (graphile_worker).
 */
module.exports = {
  async up(queryInterface, Sequelize) {
    await queryInterface.sequelize.transaction(async (transaction) => {
      const id = { type: Sequelize.UUID, primaryKey: true, defaultValue: Sequelize.literal('gen_random_uuid()') };
      const createdAt = { type: Sequelize.DATE, allowNull: false, defaultValue: Sequelize.fn('now') };
      const timestamps = { created_at: createdAt, updated_at: { ...createdAt } };
      const userRef = (onDelete) => ({
        type: Sequelize.UUID,
        allowNull: true,
        references: { model: 'users', key: 'id' },
        onDelete,
      });

      await queryInterface.addColumn(
        'users',
        'email_verified_at',
        { type: Sequelize.DATE, allowNull: true },
        { transaction },
      );
      // Accounts made before addresses were verified keep working: they were made by their holders.
      await queryInterface.sequelize.query('UPDATE users SET email_verified_at = created_at', { transaction });

      // A sign-up is held here, not in users, until its address is confirmed: an unconfirmed
      // address never becomes an account that someone could later be granted access through.
      await queryInterface.createTable(
        'account_tokens',
        {
          id,
          purpose: { type: Sequelize.STRING(24), allowNull: false },
          email: { type: Sequelize.STRING(254), allowNull: false },
          user_id: userRef('CASCADE'),
          name: { type: Sequelize.STRING(120), allowNull: true },
          password_hash: { type: Sequelize.STRING(255), allowNull: true },
          token_hash: { type: Sequelize.STRING(64), allowNull: false, unique: true },
          expires_at: { type: Sequelize.DATE, allowNull: false },
          used_at: { type: Sequelize.DATE, allowNull: true },
          created_at: createdAt,
        },
        { transaction },
      );
      await queryInterface.addConstraint('account_tokens', {
        type: 'check',
        fields: ['purpose'],
        name: 'account_tokens_purpose_check',
        where: { purpose: ['sign-up', 'password-reset'] },
        transaction,
      });

      await queryInterface.createTable(
        'invitations',
        {
          id,
          team_id: {
            type: Sequelize.UUID,
            allowNull: false,
            references: { model: 'teams', key: 'id' },
            onDelete: 'CASCADE',
          },
          email: { type: Sequelize.STRING(254), allowNull: false },
          role: { type: Sequelize.STRING(16), allowNull: false },
          token_hash: { type: Sequelize.STRING(64), allowNull: false, unique: true },
          invited_by: userRef('SET NULL'),
          expires_at: { type: Sequelize.DATE, allowNull: false },
          accepted_at: { type: Sequelize.DATE, allowNull: true },
          accepted_by: userRef('SET NULL'),
          revoked_at: { type: Sequelize.DATE, allowNull: true },
          ...timestamps,
        },
        { transaction },
      );
      await queryInterface.addConstraint('invitations', {
        type: 'check',
        fields: ['role'],
        name: 'invitations_role_check',
        where: { role: ['owner', 'designer', 'surveyor', 'reviewer', 'viewer'] },
        transaction,
      });
      await queryInterface.addIndex('invitations', ['team_id'], { transaction });

      await queryInterface.createTable(
        'mail_outbox',
        {
          id,
          kind: { type: Sequelize.STRING(40), allowNull: false },
          to_address: { type: Sequelize.STRING(254), allowNull: false },
          subject: { type: Sequelize.STRING(300), allowNull: false },
          text_body: { type: Sequelize.TEXT, allowNull: false },
          attempts: { type: Sequelize.INTEGER, allowNull: false, defaultValue: 0 },
          last_error: { type: Sequelize.TEXT, allowNull: true },
          sent_at: { type: Sequelize.DATE, allowNull: true },
          created_at: createdAt,
        },
        { transaction },
      );

      await queryInterface.createTable(
        'notification_preferences',
        {
          user_id: {
            type: Sequelize.UUID,
            allowNull: false,
            primaryKey: true,
            references: { model: 'users', key: 'id' },
            onDelete: 'CASCADE',
          },
          kind: { type: Sequelize.STRING(40), allowNull: false, primaryKey: true },
          enabled: { type: Sequelize.BOOLEAN, allowNull: false },
          ...timestamps,
        },
        { transaction },
      );
    });
    // The queue's tables and functions, so a change can add its job in its own transaction.
    await runMigrations({ connectionString: dbConfig.development.url, logger: undefined });
  },

  async down(queryInterface) {
    await queryInterface.sequelize.query('DROP SCHEMA IF EXISTS graphile_worker CASCADE');
    await queryInterface.dropTable('notification_preferences');
    await queryInterface.dropTable('mail_outbox');
    await queryInterface.dropTable('invitations');
    await queryInterface.dropTable('account_tokens');
    await queryInterface.removeColumn('users', 'email_verified_at');
  },
};
