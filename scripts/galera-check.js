#!/usr/bin/env node
// For HAProxy's health checks: one small HTTP answer per Galera node, 200 only while the node is Synced
// (wsrep_local_state 4) and in the primary component; 503 otherwise. Usage: galera-check.js <httpPort>:<sqlPort> ...
'use strict';
const http = require('node:http');
const mysql = require('mysql2/promise');

const user = process.env.DB_USER || 'bandwright';
const password = process.env.DB_PASSWORD || 'bandwright-local';

async function nodeState(port) {
  let connection;
  try {
    connection = await mysql.createConnection({ host: '127.0.0.1', port, user, password, connectTimeout: 1000 });
    const [rows] = await connection.query("SHOW GLOBAL STATUS WHERE Variable_name IN ('wsrep_local_state', 'wsrep_cluster_status', 'wsrep_ready')");
    const status = Object.fromEntries(rows.map((r) => [r.Variable_name, r.Value]));
    const synced = status.wsrep_local_state === '4' && status.wsrep_cluster_status === 'Primary' && status.wsrep_ready === 'ON';
    return { synced, status };
  } catch (error) {
    return { synced: false, status: { error: error.code || error.message } };
  } finally {
    if (connection) connection.end().catch(() => {});
  }
}

for (const pair of process.argv.slice(2)) {
  const [httpPort, sqlPort] = pair.split(':').map(Number);
  http
    .createServer(async (_request, response) => {
      const { synced, status } = await nodeState(sqlPort);
      response.writeHead(synced ? 200 : 503, { 'content-type': 'application/json' });
      response.end(JSON.stringify({ synced, ...status }));
    })
    .listen(httpPort, '127.0.0.1');
}
console.log('galera checks ready');
