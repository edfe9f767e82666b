/** All models and their associations, defined in one place. Import models from here. */
import { AuditEvent } from "./audit-event";
import { Invitation } from "./invitation";
import { Park } from "./park";
import { ParkMembership } from "./park-membership";
import { SignInAttempt } from "./sign-in-attempt";
import { User } from "./user";

Park.hasMany(ParkMembership, { foreignKey: "parkId", as: "memberships" });
ParkMembership.belongsTo(Park, { foreignKey: "parkId", as: "park" });
User.hasMany(ParkMembership, { foreignKey: "userId", as: "memberships" });
ParkMembership.belongsTo(User, { foreignKey: "userId", as: "user" });
Invitation.belongsTo(Park, { foreignKey: "parkId", as: "park" });

export { sequelize } from "@/lib/db";
export { AuditEvent, Invitation, Park, ParkMembership, SignInAttempt, User };
