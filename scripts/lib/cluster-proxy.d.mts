// Types of cluster-proxy.mjs for the API's TypeScript tests.
export interface ClusterProxy {
  listening: Promise<void>;
  close(): void;
}

export function startClusterProxy(options: { port: number; host?: string; targets: string[] }): ClusterProxy;
