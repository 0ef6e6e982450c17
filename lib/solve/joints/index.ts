export { jointEquilibrium, type JointEquilibriumOptions, type JointEquilibriumResult } from "./joint-equilibrium";
export { solveByJoints, type JointsStuck, type SolveByJointsOptions, type SolveByJointsResult } from "./solve-by-joints";
export { zeroForceMembers, type ZeroForceMember, type ZeroForceMembersOptions } from "./zero-force-members";
export type { JointBalance } from "./balance-joint";
