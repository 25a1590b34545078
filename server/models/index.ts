import type { Sequelize } from 'sequelize';
import { Maker } from './Maker';
import { Kit } from './Kit';
import { Track } from './Track';
import { User } from './User';
import { EmailToken } from './EmailToken';
import { MailboxMessage } from './MailboxMessage';
import { Car } from './Car';
import { Setup } from './Setup';
import { SetupRevision } from './SetupRevision';
import { Photo } from './Photo';
import { Comment } from './Comment';
import { Follow } from './Follow';
import { Notification } from './Notification';
import { TrackDay } from './TrackDay';
import { Run } from './Run';

export { Maker, Kit, Track, User, EmailToken, MailboxMessage, Car, Setup, SetupRevision, Photo, Comment, Follow, Notification, TrackDay, Run };

export type Models = {
  Maker: typeof Maker;
  Kit: typeof Kit;
  Track: typeof Track;
  User: typeof User;
  EmailToken: typeof EmailToken;
  MailboxMessage: typeof MailboxMessage;
  Car: typeof Car;
  Setup: typeof Setup;
  SetupRevision: typeof SetupRevision;
  Photo: typeof Photo;
  Comment: typeof Comment;
  Follow: typeof Follow;
  Notification: typeof Notification;
  TrackDay: typeof TrackDay;
  Run: typeof Run;
};

/** Registers every model on `sequelize` and wires the associations. */
export function initModels(sequelize: Sequelize): Models {
  Maker.initModel(sequelize);
  Kit.initModel(sequelize);
  Track.initModel(sequelize);
  User.initModel(sequelize);
  EmailToken.initModel(sequelize);
  MailboxMessage.initModel(sequelize);
  Car.initModel(sequelize);
  Setup.initModel(sequelize);
  SetupRevision.initModel(sequelize);
  Photo.initModel(sequelize);
  Comment.initModel(sequelize);
  Follow.initModel(sequelize);
  Notification.initModel(sequelize);
  TrackDay.initModel(sequelize);
  Run.initModel(sequelize);

  Maker.hasMany(Kit, { foreignKey: 'makerId', as: 'kits' });
  Kit.belongsTo(Maker, { foreignKey: 'makerId', as: 'maker' });
  Car.belongsTo(Kit, { foreignKey: 'kitId', as: 'kit' });
  Setup.belongsTo(Car, { foreignKey: 'carId', as: 'car' });
  Setup.belongsTo(User, { foreignKey: 'ownerId', as: 'owner' });
  SetupRevision.belongsTo(User, { foreignKey: 'authorId', as: 'author' });
  Comment.belongsTo(User, { foreignKey: 'authorId', as: 'author' });
  Comment.belongsTo(SetupRevision, { foreignKey: 'revisionId', as: 'revision' });
  TrackDay.belongsTo(Track, { foreignKey: 'trackId', as: 'track' });
  TrackDay.hasMany(Run, { foreignKey: 'trackDayId', as: 'runs' });
  Run.belongsTo(TrackDay, { foreignKey: 'trackDayId', as: 'trackDay' });
  Run.belongsTo(Car, { foreignKey: 'carId', as: 'car' });
  Run.belongsTo(Setup, { foreignKey: 'setupId', as: 'setup' });
  Run.belongsTo(SetupRevision, { foreignKey: 'revisionId', as: 'revision' });

  return { Maker, Kit, Track, User, EmailToken, MailboxMessage, Car, Setup, SetupRevision, Photo, Comment, Follow, Notification, TrackDay, Run };
}
