import { DataTypes, type QueryInterface } from 'sequelize';

const stamps = {
  created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  updated_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
};
const ref = (table: string) => ({ type: DataTypes.UUID, allowNull: false, references: { model: table, key: 'id' }, onDelete: 'CASCADE' });

/** Recordings with their probe results and derived files, transcript cues, chapters and stills. */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('recordings', {
    id: { type: DataTypes.UUID, primaryKey: true, allowNull: false },
    tutorial_id: ref('tutorials'),
    uploaded_by_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    original_name: { type: DataTypes.TEXT, allowNull: false },
    mime: { type: DataTypes.TEXT, allowNull: false },
    size_bytes: { type: DataTypes.BIGINT, allowNull: false },
    source_key: { type: DataTypes.TEXT, allowNull: false },
    status: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'uploaded' },
    progress: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    stage: { type: DataTypes.TEXT, allowNull: true },
    error: { type: DataTypes.TEXT, allowNull: true },
    duration_ms: { type: DataTypes.INTEGER, allowNull: true },
    width: { type: DataTypes.INTEGER, allowNull: true },
    height: { type: DataTypes.INTEGER, allowNull: true },
    frame_rate: { type: DataTypes.DOUBLE, allowNull: true },
    video_codec: { type: DataTypes.TEXT, allowNull: true },
    audio_codec: { type: DataTypes.TEXT, allowNull: true },
    has_audio: { type: DataTypes.BOOLEAN, allowNull: true },
    preview_key: { type: DataTypes.TEXT, allowNull: true },
    poster_key: { type: DataTypes.TEXT, allowNull: true },
    thumbnails: { type: DataTypes.JSONB, allowNull: true },
    transcript_name: { type: DataTypes.TEXT, allowNull: true },
    transcript_format: { type: DataTypes.TEXT, allowNull: true },
    ...stamps,
  });
  await qi.addIndex('recordings', ['tutorial_id']);
  await qi.sequelize.query(`ALTER TABLE recordings ADD CONSTRAINT recordings_status CHECK (status IN ('uploaded','processing','ready','failed'))`);
  await qi.createTable('cues', {
    id: { type: DataTypes.UUID, primaryKey: true, allowNull: false },
    recording_id: ref('recordings'),
    position: { type: DataTypes.INTEGER, allowNull: false },
    start_ms: { type: DataTypes.INTEGER, allowNull: false },
    end_ms: { type: DataTypes.INTEGER, allowNull: false },
    text: { type: DataTypes.TEXT, allowNull: false },
    identifier: { type: DataTypes.TEXT, allowNull: true },
  });
  await qi.addIndex('cues', ['recording_id', 'position']);
  await qi.createTable('chapters', {
    id: { type: DataTypes.UUID, primaryKey: true, allowNull: false },
    recording_id: ref('recordings'),
    title: { type: DataTypes.TEXT, allowNull: false },
    start_ms: { type: DataTypes.INTEGER, allowNull: false },
    ...stamps,
  });
  await qi.addIndex('chapters', ['recording_id', 'start_ms']);
  await qi.createTable('stills', {
    id: { type: DataTypes.UUID, primaryKey: true, allowNull: false },
    recording_id: ref('recordings'),
    at_ms: { type: DataTypes.INTEGER, allowNull: false },
    requested_ms: { type: DataTypes.INTEGER, allowNull: false },
    mode: { type: DataTypes.TEXT, allowNull: false },
    file_key: { type: DataTypes.TEXT, allowNull: false },
    width: { type: DataTypes.INTEGER, allowNull: false },
    height: { type: DataTypes.INTEGER, allowNull: false },
    sharpness: { type: DataTypes.DOUBLE, allowNull: true },
    caption: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    alt: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    ...stamps,
  });
  await qi.addIndex('stills', ['recording_id', 'at_ms']);
}

export async function down({ context: qi }: { context: QueryInterface }) {
  for (const t of ['stills', 'chapters', 'cues', 'recordings']) await qi.dropTable(t);
}
