import { message } from 'ant-design-vue';
import { useAuthStore } from '../stores/auth';

/** Downloads a file the API serves only with the bearer token (a plain link cannot carry it). */
export function useDownload() {
  const auth = useAuthStore();
  return async function open(path: string, fileName: string) {
    const response = await fetch(`/api${path}`, {
      headers: { Authorization: `Bearer ${auth.session?.token ?? ''}` },
    }).catch(() => null);
    if (!response?.ok) {
      message.error('The document could not be opened. Try again.');
      return;
    }
    const url = URL.createObjectURL(await response.blob());
    const link = document.createElement('a');
    link.href = url;
    link.download = fileName;
    link.click();
    setTimeout(() => URL.revokeObjectURL(url), 60_000);
  };
}
