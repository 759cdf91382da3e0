/**
 * Submittal revisions as a workflow: issuing (the snapshot frozen, the PDF rendered and stored,
 * the previous revision superseded), the client's decision with its record and the shop pack,
 * the stored documents, and install progress with site photos. Every transition goes through
 * the guard, checks the revision's state, and runs in one transaction with its audit event and
 * e-mails.
 */
export { closedBecause, isApproved, mayOpen, STATE_WORDS } from "./access";
export { decideSubmittal, nameToSign, signatureForm } from "./decide";
export { readDecisionRecord, readShopPack, readSubmittalPdf } from "./documents";
export { issueReadiness, issueSubmittal, type IssueReadiness } from "./issue";
export { attachSitePhoto, installedOnRoom, projectProgress, setInstalled, type InstalledPanel, type ProjectProgress, type RoomProgress } from "./install";
export { getShopPack, getSubmittal, listShopPacks, listSubmittals, type DocumentLink, type RevisionSummary, type ShopPackEntry, type SubmittalList, type SubmittalView } from "./views";
export type { HistoryLine } from "./history";
