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
import { PieceRow } from './piece';
import { Material } from './material';
import { MentionDismissal } from './mention-dismissal';
import { Article } from './article';
import { Revision } from './revision';
import { Supply } from './supply';
import { CraftClass } from './class';
import { Registration } from './registration';
import { PaymentEvent } from './payment-event';
import { TutorialVersion } from './tutorial-version';
import { watchReaderEdits } from './reader-edits';
import { AssemblyProposal } from './assembly-proposal';
import { Brief } from './brief';
import { MonthlyTarget } from './monthly-target';
import { Comment } from './comment';
import { StateChange } from './state-change';
import { MailOptOut } from './mail-opt-out';

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
PieceRow.initModel(sequelize);
Material.initModel(sequelize);
MentionDismissal.initModel(sequelize);
Article.initModel(sequelize);
Revision.initModel(sequelize);
Supply.initModel(sequelize);
CraftClass.initModel(sequelize);
Registration.initModel(sequelize);
PaymentEvent.initModel(sequelize);
TutorialVersion.initModel(sequelize);
AssemblyProposal.initModel(sequelize);
Brief.initModel(sequelize);
MonthlyTarget.initModel(sequelize);
Comment.initModel(sequelize);
StateChange.initModel(sequelize);
MailOptOut.initModel(sequelize);

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
Tutorial.hasMany(PieceRow, { foreignKey: 'tutorialId', as: 'pieces' });
PieceRow.belongsTo(Tutorial, { foreignKey: 'tutorialId', as: 'tutorial' });
Tutorial.hasMany(Material, { foreignKey: 'tutorialId', as: 'materials' });
Material.belongsTo(Tutorial, { foreignKey: 'tutorialId', as: 'tutorial' });
MentionDismissal.belongsTo(Tutorial, { foreignKey: 'tutorialId', as: 'tutorial' });
AssemblyProposal.belongsTo(Tutorial, { foreignKey: 'tutorialId', as: 'tutorial' });
Article.belongsTo(User, { foreignKey: 'updatedById', as: 'updatedBy' });
Revision.belongsTo(User, { foreignKey: 'authorId', as: 'author' });
Article.belongsTo(Tutorial, { foreignKey: 'tutorialId', as: 'tutorial' });
Revision.belongsTo(Tutorial, { foreignKey: 'tutorialId', as: 'tutorial' });
Supply.belongsTo(Tutorial, { foreignKey: 'tutorialId', as: 'tutorial' });
Tutorial.hasMany(Supply, { foreignKey: 'tutorialId', as: 'supplies' });
CraftClass.belongsTo(Studio, { foreignKey: 'studioId', as: 'studio' });
CraftClass.belongsTo(Tutorial, { foreignKey: 'tutorialId', as: 'tutorial' });
CraftClass.belongsTo(User, { foreignKey: 'createdById', as: 'createdBy' });
CraftClass.hasMany(Registration, { foreignKey: 'classId', as: 'registrations' });
Registration.belongsTo(CraftClass, { foreignKey: 'classId', as: 'class' });
Registration.belongsTo(User, { foreignKey: 'userId', as: 'user' });
Tutorial.hasMany(TutorialVersion, { foreignKey: 'tutorialId', as: 'versions' });
TutorialVersion.belongsTo(Tutorial, { foreignKey: 'tutorialId', as: 'tutorial' });
TutorialVersion.belongsTo(User, { foreignKey: 'createdById', as: 'createdBy' });
Brief.belongsTo(Studio, { foreignKey: 'studioId', as: 'studio' });
Brief.belongsTo(User, { foreignKey: 'makerId', as: 'maker' });
Brief.belongsTo(User, { foreignKey: 'createdById', as: 'createdBy' });
Brief.hasOne(Tutorial, { foreignKey: 'briefId', as: 'tutorial' });
Tutorial.belongsTo(Brief, { foreignKey: 'briefId', as: 'brief' });
Tutorial.belongsTo(User, { foreignKey: 'publishScheduledById', as: 'publishScheduledBy' });
MonthlyTarget.belongsTo(Studio, { foreignKey: 'studioId', as: 'studio' });
MonthlyTarget.belongsTo(User, { foreignKey: 'userId', as: 'user' });
Tutorial.hasMany(Comment, { foreignKey: 'tutorialId', as: 'comments' });
Comment.belongsTo(Tutorial, { foreignKey: 'tutorialId', as: 'tutorial' });
Comment.belongsTo(User, { foreignKey: 'authorId', as: 'author' });
Comment.belongsTo(User, { foreignKey: 'resolvedById', as: 'resolvedBy' });
Comment.belongsTo(Comment, { foreignKey: 'parentId', as: 'parent' });
Comment.hasMany(Comment, { foreignKey: 'parentId', as: 'replies' });
Tutorial.hasMany(StateChange, { foreignKey: 'tutorialId', as: 'stateChanges' });
StateChange.belongsTo(Tutorial, { foreignKey: 'tutorialId', as: 'tutorial' });
StateChange.belongsTo(User, { foreignKey: 'byId', as: 'by' });
watchReaderEdits();

export {
  sequelize,
  TutorialVersion,
  AssemblyProposal,
  Brief,
  MonthlyTarget,
  Comment,
  StateChange,
  MailOptOut,
  CraftClass,
  Registration,
  PaymentEvent,
  Article,
  Revision,
  Supply,
  PieceRow,
  Material,
  MentionDismissal,
  Recording,
  Cue,
  Chapter,
  Still,
  User,
  Studio,
  Membership,
  Invitation,
  PasswordReset,
  OutboxMessage,
  Tutorial,
};
