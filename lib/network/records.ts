import type { NetworkLinkInput, NetworkNodeInput } from '../validations/network';

/** Stored network rows as plain objects: the API input shapes (SI) plus their ids. */
export interface NetworkNodeRecord extends NetworkNodeInput {
  id: string;
}
export interface NetworkLinkRecord extends NetworkLinkInput {
  id: string;
}
/** A demand use tied to the outlet that serves it. */
export interface DemandUseTie {
  demandUseId: string;
  outletNodeId: string;
}

/** The whole network of one project as stored: what a revision freezes and what every solve starts from. */
export interface NetworkRecords {
  projectId: string;
  nodes: NetworkNodeRecord[];
  links: NetworkLinkRecord[];
  demandUseTies: DemandUseTie[];
}
