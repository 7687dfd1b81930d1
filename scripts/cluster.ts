import { runUntilStopped, say, sayDemoSignIns, seedDemoIfAllowed, startMailIfLocal } from '@/scripts/lib/app-launch';
import { startLocalCluster } from '@/scripts/lib/local-cluster';
import { buildWebIfChanged } from '@/scripts/lib/web-build';

// npm run cluster: three Galera nodes on DB_PORT.. (group communication, IST and SST ports from GALERA_PORT), two app servers on PORT and PORT + 1.
void runUntilStopped(async (config, stops) => {
  const sqlBase = Number(process.env.DB_PORT ?? 3520);
  const groupBase = Number(process.env.GALERA_PORT ?? 4520);
  await buildWebIfChanged(say);
  await startMailIfLocal(config, stops);
  let demo = false;
  const cluster = await startLocalCluster({
    config, sqlBase, groupBase, log: say,
    beforeServers: async (serverUrl) => { demo = await seedDemoIfAllowed(config, serverUrl); },
  });
  stops.push(cluster.stop);
  say(`Galera cluster of ${cluster.ports.length} nodes on 127.0.0.1:${cluster.ports.map((p) => p.sql).join(', ')} (data in ${config.dataDir}/galera)`);
  for (const s of cluster.servers) say(`Isoledger is running at ${s.url}`);
  say(`check each with ${cluster.servers[0].url}/api/health (cluster size and node state)`);
  if (demo) sayDemoSignIns();
  say('press Ctrl-C to stop the app servers, then the nodes');
});
