import type { Sequelize } from 'sequelize';
import { AuditEntry } from './audit-entry';
import { Finding } from './finding';
import { Invitation } from './invitation';
import { MemberDecision } from './member-decision';
import { Membership } from './membership';
import { Photo } from './photo';
import { ReCheck } from './re-check';
import { ReminderDelivery } from './reminder-delivery';
import { Report } from './report';
import { ReportShare } from './report-share';
import { RevokedSession } from './revoked-session';
import { Survey } from './survey';
import { Treatment } from './treatment';
import { TreatmentVersion } from './treatment-version';
import { User } from './user';
import { Vehicle } from './vehicle';
import { VehicleAccess } from './vehicle-access';
import { Workshop } from './workshop';

export {
  AuditEntry,
  Finding,
  Invitation,
  MemberDecision,
  Membership,
  Photo,
  ReCheck,
  ReminderDelivery,
  Report,
  ReportShare,
  RevokedSession,
  Survey,
  Treatment,
  TreatmentVersion,
  User,
  Vehicle,
  VehicleAccess,
  Workshop,
};

/** Define every model, then every association in one step (associations need all models). */
export function initModels(sequelize: Sequelize) {
  for (const m of [
    Workshop,
    User,
    Membership,
    Invitation,
    Vehicle,
    VehicleAccess,
    Survey,
    Finding,
    Photo,
    MemberDecision,
    Treatment,
    TreatmentVersion,
    ReCheck,
    ReminderDelivery,
    Report,
    ReportShare,
    RevokedSession,
    AuditEntry,
  ])
    m.initModel(sequelize);

  Workshop.hasMany(Membership, { foreignKey: 'workshopId', as: 'memberships' });
  Membership.belongsTo(Workshop, { foreignKey: 'workshopId', as: 'workshop' });
  User.hasMany(Membership, { foreignKey: 'userId', as: 'memberships' });
  Membership.belongsTo(User, { foreignKey: 'userId', as: 'user' });

  Invitation.belongsTo(Workshop, { foreignKey: 'workshopId', as: 'workshop' });
  Invitation.belongsTo(User, { foreignKey: 'invitedById', as: 'invitedBy' });

  Workshop.hasMany(Vehicle, { foreignKey: 'workshopId', as: 'vehicles' });
  Vehicle.belongsTo(Workshop, { foreignKey: 'workshopId', as: 'workshop' });
  Vehicle.belongsTo(User, { foreignKey: 'createdById', as: 'createdBy' });

  Vehicle.hasMany(VehicleAccess, { foreignKey: 'vehicleId', as: 'access' });
  VehicleAccess.belongsTo(Vehicle, { foreignKey: 'vehicleId', as: 'vehicle' });
  VehicleAccess.belongsTo(User, { foreignKey: 'userId', as: 'user' });
  VehicleAccess.belongsTo(User, { foreignKey: 'grantedById', as: 'grantedBy' });
  VehicleAccess.belongsTo(Workshop, { foreignKey: 'workshopId', as: 'workshop' });

  Vehicle.hasMany(Survey, { foreignKey: 'vehicleId', as: 'surveys' });
  Survey.belongsTo(Vehicle, { foreignKey: 'vehicleId', as: 'vehicle' });
  Survey.belongsTo(User, { foreignKey: 'inspectorId', as: 'inspector' });
  Survey.belongsTo(Workshop, { foreignKey: 'workshopId', as: 'workshop' });

  Survey.hasMany(Finding, { foreignKey: 'surveyId', as: 'findings' });
  Finding.belongsTo(Survey, { foreignKey: 'surveyId', as: 'survey' });
  Finding.belongsTo(Vehicle, { foreignKey: 'vehicleId', as: 'vehicle' });
  Finding.belongsTo(User, { foreignKey: 'authorId', as: 'author' });
  Finding.belongsTo(Workshop, { foreignKey: 'workshopId', as: 'workshop' });

  Finding.hasMany(Photo, { foreignKey: 'findingId', as: 'photos' });
  Photo.belongsTo(Finding, { foreignKey: 'findingId', as: 'finding' });
  Photo.belongsTo(User, { foreignKey: 'uploadedById', as: 'uploadedBy' });
  Photo.belongsTo(Workshop, { foreignKey: 'workshopId', as: 'workshop' });

  Vehicle.hasMany(MemberDecision, { foreignKey: 'vehicleId', as: 'decisions' });
  MemberDecision.belongsTo(Vehicle, { foreignKey: 'vehicleId', as: 'vehicle' });
  MemberDecision.belongsTo(User, { foreignKey: 'decidedById', as: 'decidedBy' });
  MemberDecision.belongsTo(Workshop, { foreignKey: 'workshopId', as: 'workshop' });

  Vehicle.hasMany(Treatment, { foreignKey: 'vehicleId', as: 'treatments' });
  Treatment.belongsTo(Vehicle, { foreignKey: 'vehicleId', as: 'vehicle' });
  Treatment.belongsTo(User, { foreignKey: 'recordedById', as: 'recordedBy' });
  Treatment.belongsTo(Workshop, { foreignKey: 'workshopId', as: 'workshop' });
  Treatment.hasMany(TreatmentVersion, { foreignKey: 'treatmentId', as: 'versions' });
  TreatmentVersion.belongsTo(Treatment, { foreignKey: 'treatmentId', as: 'treatment' });
  TreatmentVersion.belongsTo(User, { foreignKey: 'changedById', as: 'changedBy' });

  Treatment.hasMany(ReCheck, { foreignKey: 'treatmentId', as: 'rechecks' });
  ReCheck.belongsTo(Treatment, { foreignKey: 'treatmentId', as: 'treatment' });
  ReCheck.belongsTo(Vehicle, { foreignKey: 'vehicleId', as: 'vehicle' });
  ReCheck.belongsTo(Workshop, { foreignKey: 'workshopId', as: 'workshop' });
  ReCheck.belongsTo(User, { foreignKey: 'assigneeId', as: 'assignee' });
  ReCheck.belongsTo(User, { foreignKey: 'completedById', as: 'completedBy' });
  ReCheck.belongsTo(Finding, { foreignKey: 'findingId', as: 'finding' });

  ReminderDelivery.belongsTo(User, { foreignKey: 'userId', as: 'user' });
  ReminderDelivery.belongsTo(Workshop, { foreignKey: 'workshopId', as: 'workshop' });

  Vehicle.hasMany(Report, { foreignKey: 'vehicleId', as: 'reports' });
  Report.belongsTo(Vehicle, { foreignKey: 'vehicleId', as: 'vehicle' });
  Report.belongsTo(Workshop, { foreignKey: 'workshopId', as: 'workshop' });
  Report.belongsTo(User, { foreignKey: 'createdById', as: 'createdBy' });
  Report.hasMany(ReportShare, { foreignKey: 'reportId', as: 'shares' });
  ReportShare.belongsTo(Report, { foreignKey: 'reportId', as: 'report' });
  ReportShare.belongsTo(Workshop, { foreignKey: 'workshopId', as: 'workshop' });
  ReportShare.belongsTo(User, { foreignKey: 'createdById', as: 'createdBy' });
  ReportShare.belongsTo(User, { foreignKey: 'revokedById', as: 'revokedBy' });

  AuditEntry.belongsTo(User, { foreignKey: 'actorId', as: 'actor' });
  AuditEntry.belongsTo(Workshop, { foreignKey: 'workshopId', as: 'workshop' });
}
