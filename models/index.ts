import type { Sequelize } from "sequelize";
import { getSequelize } from "@/lib/db/sequelize";
import { AuditEvent } from "./audit-event";
import { Case } from "./case";
import { Customer } from "./customer";
import { ReadingSet } from "./reading-set";
import { Session } from "./session";
import { Shop } from "./shop";
import { SignInAttempt } from "./sign-in-attempt";
import { SignOff } from "./sign-off";
import { User } from "./user";
import { UserInvitation } from "./user-invitation";
import { Vehicle } from "./vehicle";
import { Cylinder } from "./cylinder";
import { PartOilAllowance } from "./part-oil-allowance";
import { RefrigerantMovement } from "./refrigerant-movement";
import { ServiceRecord } from "./service-record";
import { SpecEntry } from "./spec-entry";
import { Attachment } from "./attachment";
import { OutboundEmail } from "./outbound-email";
import { RepairProposal } from "./repair-proposal";
import { ShareLink } from "./share-link";
import { CaseConfirmedCause, CaseRepair } from "./case-outcome";
import { CaseFeatures, CasebookEntry, CasebookSymptom } from "./casebook-entry";

export { AuditEvent, Case, Customer, ReadingSet, Session, Shop, SignInAttempt, SignOff, User, Vehicle };
export { Cylinder, PartOilAllowance, RefrigerantMovement, ServiceRecord, SpecEntry, UserInvitation };
export { Attachment, OutboundEmail, RepairProposal, ShareLink };
export { CaseConfirmedCause, CaseRepair, CaseFeatures, CasebookEntry, CasebookSymptom };
export type { CylinderKind } from "./cylinder";
export type { PartReplacedJson } from "./service-record";
export type { CaseStatus, JsonObject, JsonValue } from "./case";
export type { UserRole } from "./user";
export type { ShopUnits } from "./shop";
export type { ReadingSetKind } from "./reading-set";
export type { SignOffVerdict } from "./sign-off";
export type { ExpansionDevice } from "./vehicle";

// Every model, once: initialised in this order and handed out by getModels().
const MODELS = {
  Shop,
  User,
  Session,
  SignInAttempt,
  Customer,
  Vehicle,
  Case,
  ReadingSet,
  SignOff,
  AuditEvent,
  SpecEntry,
  PartOilAllowance,
  Cylinder,
  ServiceRecord,
  RefrigerantMovement,
  ShareLink,
  RepairProposal,
  Attachment,
  OutboundEmail,
  UserInvitation,
  CaseConfirmedCause,
  CaseRepair,
  CasebookEntry,
  CasebookSymptom,
  CaseFeatures,
};

function initModels(sequelize: Sequelize) {
  for (const model of Object.values(MODELS)) model.initModel(sequelize);

  const shopScoped = { foreignKey: { name: "shopId", allowNull: false } } as const;
  Shop.hasMany(User, shopScoped);
  User.belongsTo(Shop, shopScoped);
  Shop.hasMany(Customer, shopScoped);
  Customer.belongsTo(Shop, shopScoped);
  Shop.hasMany(Vehicle, shopScoped);
  Vehicle.belongsTo(Shop, shopScoped);
  Shop.hasMany(Case, shopScoped);
  Case.belongsTo(Shop, shopScoped);
  Shop.hasMany(ReadingSet, shopScoped);
  ReadingSet.belongsTo(Shop, shopScoped);
  Shop.hasMany(SignOff, shopScoped);
  SignOff.belongsTo(Shop, shopScoped);
  Shop.hasMany(AuditEvent, shopScoped);
  AuditEvent.belongsTo(Shop, shopScoped);

  User.hasMany(Session, { foreignKey: { name: "userId", allowNull: false }, onDelete: "CASCADE" });
  Session.belongsTo(User, { foreignKey: { name: "userId", allowNull: false } });

  Customer.hasMany(Vehicle, { foreignKey: { name: "customerId", allowNull: false } });
  Vehicle.belongsTo(Customer, { foreignKey: { name: "customerId", allowNull: false } });

  Customer.hasMany(Case, { foreignKey: "customerId" });
  Case.belongsTo(Customer, { foreignKey: "customerId" });
  Vehicle.hasMany(Case, { foreignKey: "vehicleId" });
  Case.belongsTo(Vehicle, { foreignKey: "vehicleId" });
  User.hasMany(Case, { foreignKey: { name: "technicianId", allowNull: false }, as: "cases" });
  Case.belongsTo(User, { foreignKey: { name: "technicianId", allowNull: false }, as: "technician" });

  Case.hasMany(ReadingSet, {
    foreignKey: { name: "caseId", allowNull: false },
    as: "readingSets",
    onDelete: "CASCADE",
  });
  ReadingSet.belongsTo(Case, { foreignKey: { name: "caseId", allowNull: false } });
  Case.hasMany(SignOff, {
    foreignKey: { name: "caseId", allowNull: false },
    as: "signOffs",
    onDelete: "CASCADE",
  });
  SignOff.belongsTo(Case, { foreignKey: { name: "caseId", allowNull: false } });
  User.hasMany(SignOff, { foreignKey: { name: "reviewerId", allowNull: false }, as: "reviews" });
  SignOff.belongsTo(User, { foreignKey: { name: "reviewerId", allowNull: false }, as: "reviewer" });

  User.hasMany(AuditEvent, { foreignKey: "actorId", as: "auditEvents" });
  AuditEvent.belongsTo(User, { foreignKey: "actorId", as: "actor" });

  Shop.hasMany(UserInvitation, shopScoped);
  UserInvitation.belongsTo(Shop, shopScoped);
  UserInvitation.belongsTo(User, { foreignKey: { name: "invitedBy", allowNull: false }, as: "inviter" });

  Shop.hasMany(SpecEntry, shopScoped);
  SpecEntry.belongsTo(Shop, shopScoped);
  Shop.hasMany(PartOilAllowance, shopScoped);
  PartOilAllowance.belongsTo(Shop, shopScoped);
  Shop.hasMany(Cylinder, shopScoped);
  Cylinder.belongsTo(Shop, shopScoped);
  Shop.hasMany(ServiceRecord, shopScoped);
  ServiceRecord.belongsTo(Shop, shopScoped);
  Shop.hasMany(RefrigerantMovement, shopScoped);
  RefrigerantMovement.belongsTo(Shop, shopScoped);
  Case.hasOne(ServiceRecord, { foreignKey: { name: "caseId", allowNull: false }, as: "serviceRecord" });
  ServiceRecord.belongsTo(Case, { foreignKey: { name: "caseId", allowNull: false } });
  ServiceRecord.belongsTo(User, { foreignKey: { name: "technicianId", allowNull: false }, as: "technician" });
  RefrigerantMovement.belongsTo(Cylinder, { foreignKey: { name: "cylinderId", allowNull: false } });
  RefrigerantMovement.belongsTo(User, {
    foreignKey: { name: "technicianId", allowNull: false },
    as: "technician",
  });

  // The owner summary: links, proposals, photos and the e-mail that carries them.
  Shop.hasMany(ShareLink, shopScoped);
  ShareLink.belongsTo(Shop, shopScoped);
  Shop.hasMany(RepairProposal, shopScoped);
  RepairProposal.belongsTo(Shop, shopScoped);
  Shop.hasMany(Attachment, shopScoped);
  Attachment.belongsTo(Shop, shopScoped);
  Shop.hasMany(OutboundEmail, shopScoped);
  OutboundEmail.belongsTo(Shop, shopScoped);
  Case.hasMany(ShareLink, { foreignKey: { name: "caseId", allowNull: false }, as: "shareLinks" });
  ShareLink.belongsTo(Case, { foreignKey: { name: "caseId", allowNull: false } });
  ShareLink.belongsTo(User, { foreignKey: { name: "createdBy", allowNull: false }, as: "creator" });
  Case.hasMany(RepairProposal, { foreignKey: { name: "caseId", allowNull: false }, as: "proposals" });
  RepairProposal.belongsTo(Case, { foreignKey: { name: "caseId", allowNull: false } });
  RepairProposal.belongsTo(User, { foreignKey: { name: "proposedBy", allowNull: false }, as: "proposer" });
  RepairProposal.belongsTo(ShareLink, { foreignKey: "answeredViaLinkId", as: "answeredVia" });
  Case.hasMany(Attachment, { foreignKey: { name: "caseId", allowNull: false }, as: "attachments" });
  Attachment.belongsTo(Case, { foreignKey: { name: "caseId", allowNull: false } });
  Attachment.belongsTo(User, { foreignKey: { name: "uploadedBy", allowNull: false }, as: "uploader" });
  Case.hasMany(OutboundEmail, { foreignKey: "caseId", as: "emails" });
  OutboundEmail.belongsTo(Case, { foreignKey: "caseId" });
  OutboundEmail.belongsTo(ShareLink, { foreignKey: "shareLinkId" });

  // The outcome a case is closed with, and the rows the casebook derives from each case.
  Shop.hasMany(CaseConfirmedCause, shopScoped);
  CaseConfirmedCause.belongsTo(Shop, shopScoped);
  Shop.hasMany(CaseRepair, shopScoped);
  CaseRepair.belongsTo(Shop, shopScoped);
  Shop.hasMany(CasebookEntry, shopScoped);
  CasebookEntry.belongsTo(Shop, shopScoped);
  Shop.hasMany(CasebookSymptom, shopScoped);
  CasebookSymptom.belongsTo(Shop, shopScoped);
  Shop.hasMany(CaseFeatures, shopScoped);
  CaseFeatures.belongsTo(Shop, shopScoped);
  const caseOwned = { foreignKey: { name: "caseId", allowNull: false }, onDelete: "CASCADE" } as const;
  Case.hasMany(CaseConfirmedCause, { ...caseOwned, as: "confirmedCauses" });
  CaseConfirmedCause.belongsTo(Case, caseOwned);
  Case.hasMany(CaseRepair, { ...caseOwned, as: "repairs" });
  CaseRepair.belongsTo(Case, caseOwned);
  Case.hasOne(CasebookEntry, { ...caseOwned, as: "casebookEntry" });
  CasebookEntry.belongsTo(Case, caseOwned);
  Case.hasMany(CasebookSymptom, { ...caseOwned, as: "casebookSymptoms" });
  CasebookSymptom.belongsTo(Case, caseOwned);
  Case.hasOne(CaseFeatures, { ...caseOwned, as: "features" });
  CaseFeatures.belongsTo(Case, caseOwned);

  return { sequelize, ...MODELS };
}

export type Models = ReturnType<typeof initModels>;

const globalCache = globalThis as typeof globalThis & { chillwrightModels?: Models };
let moduleCache: Models | undefined;

/**
 * The models bound to the process-wide Sequelize, initialised with their associations once.
 * After closeSequelize() (scripts, tests) the next call binds them to the fresh instance.
 */
export function getModels(): Models {
  const sequelize = getSequelize();
  // Outside production the cache lives on globalThis so hot reloads do not re-initialise the models.
  if (process.env.NODE_ENV === "production") {
    if (moduleCache?.sequelize !== sequelize) moduleCache = initModels(sequelize);
    return moduleCache;
  }
  if (globalCache.chillwrightModels?.sequelize !== sequelize)
    globalCache.chillwrightModels = initModels(sequelize);
  return globalCache.chillwrightModels;
}
