import { spawn } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import { waitForOk } from './app-instance';

export interface LoadBalancer {
  url: string;
  stop: () => Promise<void>;
}

/**
 * The load balancer in front of the instances: nginx, round robin, HTTP/1.1 keep-alive to the
 * instances, idle connections closed by nginx first. On SIGTERM an instance stops listening and
 * ends each connection after the request it carries (lib/server/close-keep-alive-on-stop.ts); a
 * refused connection is retried on the next instance (`proxy_next_upstream error`, which nginx
 * allows for POST too, since nothing was sent).
 */
export function nginxConfig(dir: string, listenPort: number, upstreamPorts: number[]): string {
  return `worker_processes 1;
daemon off;
pid ${dir}/nginx.pid;
error_log ${dir}/error.log warn;
events { worker_connections 2048; }
http {
  access_log off;
  client_body_temp_path ${dir}/body;
  proxy_temp_path ${dir}/proxy;
  fastcgi_temp_path ${dir}/fastcgi;
  uwsgi_temp_path ${dir}/uwsgi;
  scgi_temp_path ${dir}/scgi;
  upstream runnel {
${upstreamPorts.map((p) => `    server 127.0.0.1:${p} max_fails=1 fail_timeout=2s;`).join('\n')}
    keepalive 64;
    # Below Node's 5 s keep-alive timeout: the balancer, not the instance, closes an idle connection,
    # so it never sends a request down a connection the instance is closing.
    keepalive_timeout 4s;
  }
  server {
    listen 127.0.0.1:${listenPort};
    # A client connection is never closed under a waiting request by a per-connection limit.
    keepalive_requests 1000000;
    client_max_body_size 50m;
    location / {
      proxy_pass http://runnel;
      proxy_http_version 1.1;
      proxy_set_header Connection "";
      proxy_next_upstream error timeout;
      proxy_next_upstream_tries ${upstreamPorts.length + 1};
      proxy_connect_timeout 2s;
      proxy_read_timeout 60s;
      proxy_set_header Host $http_host;
      proxy_set_header X-Forwarded-For $proxy_add_x_forwarded_for;
      proxy_set_header X-Forwarded-Proto $scheme;
    }
  }
}
`;
}

/** Starts nginx (Debian's /usr/sbin/nginx) on 127.0.0.1:`listenPort` with its files in `dir`. */
export async function startNginx(dir: string, listenPort: number, upstreamPorts: number[]): Promise<LoadBalancer> {
  fs.mkdirSync(dir, { recursive: true });
  const conf = path.join(dir, 'nginx.conf');
  fs.writeFileSync(conf, nginxConfig(dir, listenPort, upstreamPorts));
  const binary = fs.existsSync('/usr/sbin/nginx') ? '/usr/sbin/nginx' : 'nginx';
  const child = spawn(binary, ['-p', dir, '-c', conf], { stdio: ['ignore', 'ignore', 'pipe'] });
  let stderr = '';
  child.stderr.on('data', (d) => (stderr += d));
  const exited = new Promise<void>((resolve) => child.once('exit', () => resolve()));
  try {
    await waitForOk(`http://127.0.0.1:${listenPort}/api/health`, 20_000, child);
  } catch (error) {
    child.kill('SIGKILL');
    throw new Error(`nginx: ${(error as Error).message}\n${stderr}`);
  }
  return {
    url: `http://127.0.0.1:${listenPort}`,
    stop: async () => {
      if (child.exitCode !== null) return;
      child.kill('SIGQUIT');
      await exited;
    },
  };
}
