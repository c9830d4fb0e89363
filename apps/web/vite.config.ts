import vue from '@vitejs/plugin-vue';
import Components from 'unplugin-vue-components/vite';
import { AntDesignVueResolver } from 'unplugin-vue-components/resolvers';
import { defineConfig } from 'vite';
import { compression } from 'vite-plugin-compression2';

// ant-design-vue components are imported on demand (the whole library would weigh ~460 KB gzip).
export default defineConfig({
  plugins: [
    vue(),
    Components({
      resolvers: [AntDesignVueResolver({ importStyle: false, resolveIcons: true })],
      dts: 'src/components.d.ts',
    }),
    // Brotli and gzip files beside each built file, at the highest levels (too slow to do per request),
    // for the server to send as they are.
    compression({ algorithms: ['brotliCompress', 'gzip'] }),
  ],
  server: {
    port: Number(process.env.VITE_PORT ?? 4173),
    proxy: { '/api': process.env.APP_URL ?? 'http://127.0.0.1:4100' },
  },
  build: { chunkSizeWarningLimit: 900 },
});
