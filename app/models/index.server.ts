// Every model is bound to the one Sequelize instance when its module loads; this module declares the
// associations, once, so importing from here gives models ready to query.
import { sequelize } from "~/db/sequelize.server";
import { AuditEvent } from "./audit-event.server";
import { AuthToken } from "./auth-token.server";
import { Detail, DetailZone, liveDetailSql } from "./detail.server";
import { DetailRevision } from "./detail-revision.server";
import { DetailSet, DetailSetMember } from "./detail-set.server";
import { Download } from "./download.server";
import { Entitlement } from "./entitlement.server";
import { MaterialRecord } from "./material.server";
import { Payment } from "./payment.server";
import { PaymentEvent } from "./payment-event.server";
import { ReviewComment } from "./review-comment.server";
import { SavedDetail } from "./saved-detail.server";
import { Session } from "./session.server";
import { SignInAttempt } from "./sign-in-attempt.server";
import { Upload } from "./upload.server";
import { User } from "./user.server";

export { sequelize };
export { liveDetailSql };
export { Detail, DetailZone, DetailRevision, DetailSet, DetailSetMember, MaterialRecord, User };
export { Session, AuthToken, SignInAttempt, AuditEvent };
export { Entitlement, PaymentEvent, Payment, Download };
export { ReviewComment, SavedDetail, Upload };

// The catalogue: a detail, its zones, its revisions (one of them published) and the sets it belongs to.
Detail.hasMany(DetailZone, { foreignKey: "detailId", as: "zones" });
Detail.hasMany(DetailRevision, { foreignKey: "detailId", as: "revisions" });
DetailRevision.belongsTo(Detail, { foreignKey: "detailId", as: "detail" });
// The published revision points back at a revision of the same detail: no constraint, the migration owns keys.
Detail.belongsTo(DetailRevision, { foreignKey: "publishedRevisionId", as: "publishedRevision", constraints: false });
Detail.belongsToMany(DetailSet, { through: DetailSetMember, foreignKey: "detailId", otherKey: "setId", as: "sets" });
DetailSet.belongsToMany(Detail, { through: DetailSetMember, foreignKey: "setId", otherKey: "detailId", as: "details" });

// Accounts.
User.hasMany(Session, { foreignKey: "userId", as: "sessions" });
Session.belongsTo(User, { foreignKey: "userId", as: "user" });
User.hasMany(AuthToken, { foreignKey: "userId", as: "authTokens" });
AuthToken.belongsTo(User, { foreignKey: "userId", as: "user" });
AuditEvent.belongsTo(User, { foreignKey: "actorId", as: "actor" });

// Payments: what a user paid for, what it entitles them to and what they downloaded.
User.hasMany(Entitlement, { foreignKey: "userId", as: "entitlements" });
Entitlement.belongsTo(User, { foreignKey: "userId", as: "user" });
DetailSet.hasMany(Entitlement, { foreignKey: "setId", as: "entitlements" });
Entitlement.belongsTo(DetailSet, { foreignKey: "setId", as: "detailSet" });
User.hasMany(Payment, { foreignKey: "userId", as: "payments" });
Payment.belongsTo(User, { foreignKey: "userId", as: "user" });
User.hasMany(Download, { foreignKey: "userId", as: "downloads" });
Download.belongsTo(User, { foreignKey: "userId", as: "user" });
Download.belongsTo(DetailSet, { foreignKey: "setId", as: "detailSet" });

// The desk: authors and reviewers, review comments, uploads, members' saved details.
DetailRevision.belongsTo(User, { foreignKey: "authorId", as: "author", constraints: false });
DetailRevision.belongsTo(User, { foreignKey: "reviewerId", as: "reviewer", constraints: false });
DetailRevision.hasMany(ReviewComment, { foreignKey: "revisionId", as: "comments" });
ReviewComment.belongsTo(DetailRevision, { foreignKey: "revisionId", as: "revision" });
ReviewComment.belongsTo(User, { foreignKey: "authorId", as: "author", constraints: false });
DetailRevision.hasMany(Upload, { foreignKey: "revisionId", as: "uploads" });
Upload.belongsTo(DetailRevision, { foreignKey: "revisionId", as: "revision" });
Upload.belongsTo(User, { foreignKey: "uploaderId", as: "uploader", constraints: false });
User.hasMany(SavedDetail, { foreignKey: "userId", as: "savedDetails" });
SavedDetail.belongsTo(User, { foreignKey: "userId", as: "user" });
Detail.hasMany(SavedDetail, { foreignKey: "detailId", as: "saves" });
SavedDetail.belongsTo(Detail, { foreignKey: "detailId", as: "detail" });
