/** A stock that changed after a solution block used it: the entry page's notice, server and client. */
export interface NewerStock {
  blockId: string;
  blockName: string;
  parentEntryId: string;
  parentEntryTitle: string;
  parentBlockId: string;
  stockName: string;
  usedRevision: number;
  currentRevision: number;
  /** The first revision after the one used in which the stock block changed. */
  changedInRevision: number | null;
  /** The current revision is an amendment of a countersigned one: its reason. */
  amendmentReason: string | null;
  /** The stock block is no longer in its entry: there is nothing to update to. */
  removed: boolean;
  diffHref: string;
}
