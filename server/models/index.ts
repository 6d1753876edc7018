import { sequelize } from '../db';
import { Invitation } from './invitation';
import { Membership } from './membership';
import { OutboxMessage } from './outbox-message';
import { PasswordReset } from './password-reset';
import { Studio } from './studio';
import { Tutorial } from './tutorial';
import { User } from './user';
import { Recording } from './recording';
import { Cue } from './cue';
import { Chapter } from './chapter';
import { Still } from './still';

User.initModel(sequelize);
Studio.initModel(sequelize);
Membership.initModel(sequelize);
Invitation.initModel(sequelize);
PasswordReset.initModel(sequelize);
OutboxMessage.initModel(sequelize);
Tutorial.initModel(sequelize);
Recording.initModel(sequelize);
Cue.initModel(sequelize);
Chapter.initModel(sequelize);
Still.initModel(sequelize);

Studio.hasMany(Membership, { foreignKey: 'studioId', as: 'memberships' });
Membership.belongsTo(Studio, { foreignKey: 'studioId', as: 'studio' });
User.hasMany(Membership, { foreignKey: 'userId', as: 'memberships' });
Membership.belongsTo(User, { foreignKey: 'userId', as: 'user' });
Invitation.belongsTo(Studio, { foreignKey: 'studioId', as: 'studio' });
Invitation.belongsTo(User, { foreignKey: 'invitedById', as: 'invitedBy' });
PasswordReset.belongsTo(User, { foreignKey: 'userId', as: 'user' });
Studio.hasMany(Tutorial, { foreignKey: 'studioId', as: 'tutorials' });
Tutorial.belongsTo(Studio, { foreignKey: 'studioId', as: 'studio' });
Tutorial.belongsTo(User, { foreignKey: 'authorId', as: 'author' });

Tutorial.hasMany(Recording, { foreignKey: 'tutorialId', as: 'recordings' });
Recording.belongsTo(Tutorial, { foreignKey: 'tutorialId', as: 'tutorial' });
Recording.hasMany(Cue, { foreignKey: 'recordingId', as: 'cues' });
Recording.hasMany(Chapter, { foreignKey: 'recordingId', as: 'chapters' });
Recording.hasMany(Still, { foreignKey: 'recordingId', as: 'stills' });
Chapter.belongsTo(Recording, { foreignKey: 'recordingId', as: 'recording' });
Still.belongsTo(Recording, { foreignKey: 'recordingId', as: 'recording' });

export { sequelize, Recording, Cue, Chapter, Still, User, Studio, Membership, Invitation, PasswordReset, OutboxMessage, Tutorial };
