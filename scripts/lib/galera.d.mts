// Types of galera.mjs for the API's TypeScript tests.
import type { MariaDBServer } from './mariadb.d.mts';

export interface GaleraNode extends MariaDBServer {
  name: string;
  dir: string;
  port: number;
  groupPort: number;
  istPort: number;
  sstPort: number;
}

export interface GaleraCluster {
  name: string;
  dir: string;
  nodes: GaleraNode[];
}

export function galeraFolder(name: string): string;
export function startGaleraCluster(options?: { name?: string; size?: number }): Promise<GaleraCluster>;
export function restartGaleraNode(cluster: GaleraCluster, node: GaleraNode): Promise<void>;
export function stopGaleraNode(node: GaleraNode): void;
export function stopGaleraCluster(cluster: GaleraCluster): void;
export function readGaleraCluster(name?: string): GaleraCluster | null;
export function galeraStatus(node: GaleraNode, variable: string): string | null;
