export type { InfluenceQuantity, ReactionQuantity, ShearQuantity, MomentQuantity, SlopeQuantity, DeflectionQuantity, ReactionInfluence, MemberInfluence } from "./types.js";
export { memberInfluence, tryMemberInfluence, influenceLine, tryInfluenceLine } from "./influence.js";
