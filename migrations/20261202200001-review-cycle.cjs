'use strict';

/**
 * The review cycle: numbered revisions (immutable snapshots of the whole project's design),
 * comments on a revision or on the working copy, and the project's activity feed.
 *
 * Lines lose their designer-set status and free-text "Checked by": approval is now something only a
 * reviewer or owner records, on a revision. Nothing becomes approved here. Each line whose old
 * status or "Checked by" said anything is remembered as one activity row (kind
 * `line.review-state-carried-over`) with the old words, so no one's note is lost; the line itself
 * stays in the working copy.
 */
const STATUSES = ['draft', 'submitted', 'changes-requested', 'approved', 'issued', 'superseded'];
const OLD_STATUS_WORDS = { draft: 'Draft', 'for-checking': 'For checking', issued: 'Issued for building' };

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
      const person = {
        type: Sequelize.UUID,
        allowNull: true,
        references: { model: 'users', key: 'id' },
        onDelete: 'SET NULL',
      };

      await queryInterface.createTable(
        'revisions',
        {
          id,
          project_id: project,
          number: { type: Sequelize.INTEGER, allowNull: false },
          status: { type: Sequelize.STRING(24), allowNull: false, defaultValue: 'draft' },
          note: { type: Sequelize.TEXT, allowNull: false, defaultValue: '' },
          // The whole design as it was when the revision was made; never updated.
          snapshot: { type: Sequelize.JSONB, allowNull: false },
          created_by: person,
          submitted_by: person,
          submitted_at: { type: Sequelize.DATE, allowNull: true },
          // The last review decision (approve or send back): who and when, from the signed-in user.
          reviewed_by: person,
          reviewed_at: { type: Sequelize.DATE, allowNull: true },
          issued_by: person,
          issued_at: { type: Sequelize.DATE, allowNull: true },
          created_at: now,
          updated_at: now,
        },
        { transaction },
      );
      await queryInterface.addConstraint('revisions', {
        type: 'unique',
        fields: ['project_id', 'number'],
        name: 'revisions_project_number_unique',
        transaction,
      });
      await queryInterface.addConstraint('revisions', {
        type: 'check',
        fields: ['status'],
        name: 'revisions_status_check',
        where: { status: STATUSES },
        transaction,
      });

      await queryInterface.createTable(
        'comments',
        {
          id,
          project_id: project,
          // null = on the working copy
          revision_id: {
            type: Sequelize.UUID,
            allowNull: true,
            references: { model: 'revisions', key: 'id' },
            onDelete: 'CASCADE',
          },
          parent_id: {
            type: Sequelize.UUID,
            allowNull: true,
            references: { model: 'comments', key: 'id' },
            onDelete: 'CASCADE',
          },
          author_id: person,
          body: { type: Sequelize.TEXT, allowNull: false },
          anchor: { type: Sequelize.JSONB, allowNull: false },
          mentions: { type: Sequelize.JSONB, allowNull: false, defaultValue: [] },
          resolved_by: person,
          resolved_at: { type: Sequelize.DATE, allowNull: true },
          created_at: now,
          updated_at: now,
        },
        { transaction },
      );
      await queryInterface.addIndex('comments', ['project_id', 'created_at'], { transaction });
      await queryInterface.addIndex('comments', ['parent_id'], { transaction });

      await queryInterface.createTable(
        'activities',
        {
          id,
          project_id: project,
          actor_user_id: person,
          kind: { type: Sequelize.STRING(48), allowNull: false },
          subject_type: { type: Sequelize.STRING(24), allowNull: true },
          subject_id: { type: Sequelize.UUID, allowNull: true },
          summary: { type: Sequelize.TEXT, allowNull: false },
          data: { type: Sequelize.JSONB, allowNull: false, defaultValue: {} },
          created_at: now,
        },
        { transaction },
      );
      await queryInterface.addIndex('activities', ['project_id', 'created_at'], { transaction });

      const [lines] = await queryInterface.sequelize.query(
        "SELECT id, project_id, name, status, checked_by FROM lines WHERE status <> 'draft' OR checked_by <> ''",
        { transaction },
      );
      for (const line of lines) {
        const words = [`status was "${OLD_STATUS_WORDS[line.status] ?? line.status}"`];
        if (line.checked_by) words.push(`"Checked by" was typed as "${line.checked_by}"`);
        await queryInterface.bulkInsert(
          'activities',
          [
            {
              project_id: line.project_id,
              actor_user_id: null,
              kind: 'line.review-state-carried-over',
              subject_type: 'line',
              subject_id: line.id,
              summary: `Before revisions, line "${line.name}": ${words.join('; ')}. Not a recorded approval: issue a revision and have it reviewed.`,
              data: JSON.stringify({ oldStatus: line.status, checkedBy: line.checked_by }),
              created_at: new Date(),
            },
          ],
          { transaction },
        );
      }
      await queryInterface.removeConstraint('lines', 'lines_status_check', { transaction });
      await queryInterface.removeColumn('lines', 'status', { transaction });
      await queryInterface.removeColumn('lines', 'checked_by', { transaction });
    });
  },

  async down(queryInterface, Sequelize) {
    await queryInterface.sequelize.transaction(async (transaction) => {
      await queryInterface.addColumn(
        'lines',
        'status',
        { type: Sequelize.STRING(16), allowNull: false, defaultValue: 'draft' },
        { transaction },
      );
      await queryInterface.addColumn(
        'lines',
        'checked_by',
        { type: Sequelize.STRING(120), allowNull: false, defaultValue: '' },
        { transaction },
      );
      await queryInterface.sequelize.query(
        `UPDATE lines SET status = a.data->>'oldStatus', checked_by = COALESCE(a.data->>'checkedBy', '')
           FROM activities a WHERE a.kind = 'line.review-state-carried-over' AND a.subject_id = lines.id`,
        { transaction },
      );
      await queryInterface.addConstraint('lines', {
        type: 'check',
        fields: ['status'],
        name: 'lines_status_check',
        where: { status: ['draft', 'for-checking', 'issued'] },
        transaction,
      });
      await queryInterface.dropTable('activities', { transaction });
      await queryInterface.dropTable('comments', { transaction });
      await queryInterface.dropTable('revisions', { transaction });
    });
  },
};
