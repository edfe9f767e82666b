/** All models and their associations, defined in one place. Import models from here. */
import { AccountLink } from "./account-link";
import { AuditEvent } from "./audit-event";
import { Hazard } from "./hazard";
import { Invitation } from "./invitation";
import { MailSend } from "./mail-send";
import { Notice } from "./notice";
import { NoticeDelivery } from "./notice-delivery";
import { Park } from "./park";
import { ParkLayerVersion } from "./park-layer-version";
import { ParkMembership } from "./park-membership";
import { ParkState } from "./park-state";
import { Photo } from "./photo";
import { PushSubscription } from "./push-subscription";
import { RequestCount } from "./request-count";
import { RideLog } from "./ride-log";
import { Setup } from "./setup";
import { SignInAttempt } from "./sign-in-attempt";
import { Subscription } from "./subscription";
import { Trail } from "./trail";
import { TrailFeature } from "./trail-feature";
import { TrailReport } from "./trail-report";
import { TrailVersion } from "./trail-version";
import { User } from "./user";
import { ParkWeather, WeatherHour } from "./weather";

Park.hasMany(ParkMembership, { foreignKey: "parkId", as: "memberships" });
ParkMembership.belongsTo(Park, { foreignKey: "parkId", as: "park" });
User.hasMany(ParkMembership, { foreignKey: "userId", as: "memberships" });
ParkMembership.belongsTo(User, { foreignKey: "userId", as: "user" });
Invitation.belongsTo(Park, { foreignKey: "parkId", as: "park" });
User.hasMany(AccountLink, { foreignKey: "userId", as: "accountLinks" });
Invitation.belongsTo(User, { foreignKey: "invitedBy", as: "inviter" });
Park.hasMany(ParkLayerVersion, { foreignKey: "parkId", as: "layerVersions" });

Park.hasMany(Trail, { foreignKey: "parkId", as: "trails" });
Trail.belongsTo(Park, { foreignKey: "parkId", as: "park" });
Trail.hasMany(TrailVersion, { foreignKey: "trailId", as: "versions" });
Trail.hasMany(TrailFeature, { foreignKey: "trailId", as: "features" });
TrailFeature.belongsTo(Trail, { foreignKey: "trailId", as: "trail" });

Trail.hasMany(TrailReport, { foreignKey: "trailId", as: "reports" });
TrailReport.belongsTo(Trail, { foreignKey: "trailId", as: "trail" });
TrailReport.belongsTo(User, { foreignKey: "reporterId", as: "reporter" });
Park.hasMany(ParkState, { foreignKey: "parkId", as: "states" });
Park.hasMany(Hazard, { foreignKey: "parkId", as: "hazards" });
Hazard.belongsTo(Trail, { foreignKey: "trailId", as: "trail" });
Hazard.hasMany(Photo, { foreignKey: "hazardId", as: "photos" });

User.hasMany(Setup, { foreignKey: "userId", as: "setups" });
User.hasMany(RideLog, { foreignKey: "userId", as: "rideLogs" });
RideLog.belongsTo(Setup, { foreignKey: "setupId", as: "setup" });

User.hasMany(Subscription, { foreignKey: "userId", as: "subscriptions" });
Subscription.belongsTo(Park, { foreignKey: "parkId", as: "park" });
Subscription.belongsTo(User, { foreignKey: "userId", as: "user" });
User.hasMany(PushSubscription, { foreignKey: "userId", as: "pushSubscriptions" });
PushSubscription.belongsTo(Park, { foreignKey: "parkId", as: "park" });
Notice.belongsTo(Park, { foreignKey: "parkId", as: "park" });
Notice.hasMany(NoticeDelivery, { foreignKey: "noticeId", as: "deliveries" });
NoticeDelivery.belongsTo(Notice, { foreignKey: "noticeId", as: "notice" });
Park.hasOne(ParkWeather, { foreignKey: "parkId", as: "weather" });
Park.hasMany(WeatherHour, { foreignKey: "parkId", as: "weatherHours" });

export { primaryRows, sequelize } from "@/models/db";
export { parkVersionListener, PARK_VERSIONS_CHANNEL, type ListenerMark } from "@/models/park-version-listener";
export {
  AccountLink,
  AuditEvent,
  Hazard,
  Invitation,
  MailSend,
  Notice,
  NoticeDelivery,
  Park,
  ParkLayerVersion,
  ParkMembership,
  ParkState,
  ParkWeather,
  Photo,
  PushSubscription,
  RequestCount,
  RideLog,
  Setup,
  SignInAttempt,
  Subscription,
  Trail,
  TrailFeature,
  TrailReport,
  TrailVersion,
  User,
  WeatherHour,
};
