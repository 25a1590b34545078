import type { Sequelize } from 'sequelize';
import { Maker } from './Maker';
import { Kit } from './Kit';
import { Track } from './Track';
import { User } from './User';
import { EmailToken } from './EmailToken';
import { MailboxMessage } from './MailboxMessage';

export { Maker, Kit, Track, User, EmailToken, MailboxMessage };

export type Models = {
  Maker: typeof Maker;
  Kit: typeof Kit;
  Track: typeof Track;
  User: typeof User;
  EmailToken: typeof EmailToken;
  MailboxMessage: typeof MailboxMessage;
};

/** Registers every model on `sequelize` and wires the associations. */
export function initModels(sequelize: Sequelize): Models {
  Maker.initModel(sequelize);
  Kit.initModel(sequelize);
  Track.initModel(sequelize);
  User.initModel(sequelize);
  EmailToken.initModel(sequelize);
  MailboxMessage.initModel(sequelize);

  Maker.hasMany(Kit, { foreignKey: 'makerId', as: 'kits' });
  Kit.belongsTo(Maker, { foreignKey: 'makerId', as: 'maker' });

  return { Maker, Kit, Track, User, EmailToken, MailboxMessage };
}
