import { ref } from 'vue';
import { ApiRequestError } from '../api/client';
import { useAuthStore } from '../stores/auth';

/**
 * Uploads one file with a progress bar (fetch cannot report upload progress, XMLHttpRequest can)
 * and turns the API's error answer into an ApiRequestError like every other call.
 */
export function useUpload<T>() {
  const auth = useAuthStore();
  const progress = ref(0);
  const uploading = ref(false);

  function upload(path: string, file: File): Promise<T> {
    uploading.value = true;
    progress.value = 0;
    return new Promise<T>((resolve, reject) => {
      const xhr = new XMLHttpRequest();
      xhr.open('POST', `/api${path}`);
      if (auth.session) xhr.setRequestHeader('Authorization', `Bearer ${auth.session.token}`);
      xhr.upload.onprogress = (event) => {
        if (event.lengthComputable) progress.value = Math.round((event.loaded / event.total) * 100);
      };
      xhr.onload = () => {
        uploading.value = false;
        let body: { error?: { code: string; message: string; fields?: Record<string, string> } } | null;
        try {
          body = JSON.parse(xhr.responseText);
        } catch {
          body = null;
        }
        if (xhr.status >= 200 && xhr.status < 300) return resolve(body as T);
        reject(
          new ApiRequestError(
            xhr.status,
            body?.error?.code ?? 'upload_failed',
            body?.error?.message ?? `The upload failed (${xhr.status}).`,
            body?.error?.fields,
          ),
        );
      };
      xhr.onerror = () => {
        uploading.value = false;
        reject(new ApiRequestError(0, 'network', 'The upload was interrupted. Check your connection and try again.'));
      };
      const form = new FormData();
      form.append('file', file, file.name);
      xhr.send(form);
    });
  }

  return { upload, progress, uploading };
}
