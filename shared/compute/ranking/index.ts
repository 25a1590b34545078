/** Ranking by votes: pure functions shared by the API (ordering) and the app (explaining the order). */
export { WILSON_Z_95, compareByWilson, wilsonLowerBound, type VoteTally } from './wilson';
