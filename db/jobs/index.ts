// Jobs: a customer's engine (or the shop's own) as a work order, from intake to closed. Every function
// takes the caller and checks the role and that the job belongs to the caller's shop. One concern a file:
// view (the shape and the one loader), reads, writes, plan (taking a plan and its override), moves,
// readings (after-cut verification), sharing (the customer's link and questions), events (history, mail),
// quote (the price, approved with the plan) and quote-view (its figures read back).
export { isJobCustomer, jobFor, parsePlan, planVerdict, type JobView, type Override, type Person, type PlanSnapshot } from "./view";
export { getJob, jobDetail, jobsForStudy, listJobs, type JobDetail } from "./reads";
export { createJob, updateJob } from "./writes";
export { moveJob } from "./moves";
export { recordReadings } from "./readings";
export { askQuestion, shareJob } from "./sharing";
export { checkApprovedQuote, quoteFor, saveQuote } from "./quote";
export { parseQuote, quoteFingerprint, quoteView, type QuoteView } from "./quote-view";
