import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';

// In development the API and the collaboration websocket live on the Express server (port 3000);
// the production build is served by that same server from dist/client.
const serverOrigin = 'http://127.0.0.1:3000';

export default defineConfig({
  plugins: [react(), tailwindcss()],
  server: {
    host: '127.0.0.1',
    port: 5173,
    // Host and Origin stay the dev server's, so the server's same-host Origin check (CSRF) passes.
    proxy: {
      '/api': { target: serverOrigin, changeOrigin: false },
      '/collab': { target: serverOrigin, ws: true, changeOrigin: false },
    },
  },
  build: {
    outDir: 'dist/client',
    emptyOutDir: true,
    rolldownOptions: {
      output: {
        // Libraries change less often than our code; separate chunks stay cached across releases.
        codeSplitting: {
          groups: [
            { name: 'react', test: /node_modules[\\/](react|react-dom|scheduler|react-router|react-router-dom)[\\/]/, priority: 2 },
            // openchemlib (over 1 MB) stays out of the shared chunk: it loads when a structure is shown.
            { name: 'openchemlib', test: /node_modules[\\/]openchemlib[\\/]/, priority: 3 },
            { name: 'vendor', test: /node_modules/, priority: 1 },
          ],
        },
      },
    },
  },
});
