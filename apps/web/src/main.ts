import '@fontsource/work-sans/400.css';
import '@fontsource/work-sans/500.css';
import '@fontsource/work-sans/600.css';
import 'ant-design-vue/dist/reset.css';
import './styles.css';
import { VueQueryPlugin, QueryClient } from '@tanstack/vue-query';
import { createPinia } from 'pinia';
import { createApp } from 'vue';
import App from './App.vue';
import { ApiRequestError } from './api/client';
import { router } from './router';
import { repairAria } from './ariaRepairs';
import { labelTableCells } from './tableLabels';
import { watchDom } from './watchDom';

const queryClient = new QueryClient({
  defaultOptions: {
    queries: {
      staleTime: 15_000,
      // Retry what may pass (a service briefly down), not what cannot (a 4xx answer).
      retry: (count, error) => !(error instanceof ApiRequestError && error.status < 500) && count < 2,
    },
  },
});

createApp(App).use(createPinia()).use(router).use(VueQueryPlugin, { queryClient }).mount('#app');
watchDom([repairAria, labelTableCells]);
