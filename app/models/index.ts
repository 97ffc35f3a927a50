import type { Sequelize } from "sequelize";
import { db } from "~/db/sequelize.server";
import { Detail, DetailZone } from "./detail";
import { DetailRevision } from "./detail-revision";
import { DetailSet, DetailSetMember } from "./detail-set";
import { MaterialRecord } from "./material";
import { User } from "./user";
import { Session } from "./session";
import { AuthToken } from "./auth-token";
import { SignInAttempt } from "./sign-in-attempt";
import { AuditEvent } from "./audit-event";
import { Entitlement } from "./entitlement";
import { PaymentEvent } from "./payment-event";
import { Payment } from "./payment";
import { Download } from "./download";
import { ReviewComment } from "./review-comment";
import { SavedDetail } from "./saved-detail";
import { Upload } from "./upload";

export { Detail, DetailZone, DetailRevision, DetailSet, DetailSetMember, MaterialRecord, User };
export { Session, AuthToken, SignInAttempt, AuditEvent };
export { Entitlement, PaymentEvent, Payment, Download };
export { ReviewComment, SavedDetail, Upload };

const initialised = new WeakSet<Sequelize>();

/** Binds every model to a Sequelize instance and declares the associations, once per instance. */
export function initModels(sequelize: Sequelize): Sequelize {
  if (initialised.has(sequelize)) return sequelize;
  for (const model of [User, MaterialRecord, Detail, DetailZone, DetailRevision, DetailSet, DetailSetMember]) {
    model.initModel(sequelize);
  }
  Detail.hasMany(DetailZone, { foreignKey: "detailId", as: "zones" });
  Detail.hasMany(DetailRevision, { foreignKey: "detailId", as: "revisions" });
  DetailRevision.belongsTo(Detail, { foreignKey: "detailId", as: "detail" });
  Detail.belongsToMany(DetailSet, { through: DetailSetMember, foreignKey: "detailId", otherKey: "setId", as: "sets" });
  DetailSet.belongsToMany(Detail, { through: DetailSetMember, foreignKey: "setId", otherKey: "detailId", as: "details" });
  for (const model of [Session, AuthToken, SignInAttempt, AuditEvent]) model.initModel(sequelize);
  Session.belongsTo(User, { foreignKey: "userId", as: "user" });
  AuditEvent.belongsTo(User, { foreignKey: "actorId", as: "actor" });
  for (const model of [Entitlement, PaymentEvent, Payment, Download]) model.initModel(sequelize);
  // The desk: review comments, members' saved details, revision uploads.
  for (const model of [ReviewComment, SavedDetail, Upload]) model.initModel(sequelize);
  initialised.add(sequelize);
  return sequelize;
}

/** The app's models bound to the app's database. */
export function models(): Sequelize {
  return initModels(db());
}
