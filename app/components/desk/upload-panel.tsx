import { useRef, useState } from "react";
import { useRevalidator } from "react-router";
import { useRootData } from "~/components/root-data";
import { readUploadRequest } from "~/desk/upload-form";

export interface UploadItem {
  id: number;
  name: string;
  contentType: string;
  byteSize: number;
  caption: string | null;
  href: string;
}

function size(bytes: number): string {
  return bytes >= 1024 * 1024
    ? `${(bytes / 1024 / 1024).toFixed(1)} MB`
    : `${Math.max(1, Math.round(bytes / 1024))} kB`;
}

type Progress =
  | { state: "idle" }
  | { state: "sending"; percent: number }
  | { state: "failed"; message: string }
  | { state: "done"; name: string };

/**
 * Drawings and photos for a revision. Sent with XMLHttpRequest rather than fetch because only XHR
 * reports upload progress; the server checks type, size and authorship again whatever this shows.
 */
export function UploadPanel({
  revisionId,
  uploads,
  editable,
}: {
  revisionId: number;
  uploads: UploadItem[];
  editable: boolean;
}) {
  const csrf = useRootData()?.csrfToken ?? "";
  const revalidator = useRevalidator();
  const fileInput = useRef<HTMLInputElement>(null);
  const [caption, setCaption] = useState("");
  const [progress, setProgress] = useState<Progress>({ state: "idle" });

  function post(body: FormData, onDone: () => void) {
    const xhr = new XMLHttpRequest();
    xhr.open("POST", `/desk/revisions/${revisionId}/uploads`);
    xhr.responseType = "json";
    xhr.upload.onprogress = (event) => {
      if (event.lengthComputable)
        setProgress({ state: "sending", percent: Math.round((event.loaded / event.total) * 100) });
    };
    xhr.onload = () => {
      const answer = xhr.response as { message?: string } | null;
      if (xhr.status >= 400)
        setProgress({ state: "failed", message: answer?.message ?? `The server refused the file (${xhr.status}).` });
      else onDone();
      revalidator.revalidate();
    };
    xhr.onerror = () => setProgress({ state: "failed", message: "The connection failed; nothing was attached." });
    body.set("csrf", csrf);
    xhr.send(body);
  }

  function send() {
    const file = fileInput.current?.files?.[0];
    if (file && file.size > 5 * 1024 * 1024)
      return setProgress({ state: "failed", message: "That file is larger than 5 MB." });
    const body = new FormData();
    body.set("intent", "attach");
    if (file) body.set("file", file);
    body.set("caption", caption);
    // The same check the server makes, so a missing file or an overlong caption is said at once.
    const request = readUploadRequest(body);
    if (!request.success || !file)
      return setProgress({
        state: "failed",
        message: request.success ? "Choose a file to attach." : request.error.issues[0].message,
      });
    setProgress({ state: "sending", percent: 0 });
    post(body, () => {
      setProgress({ state: "done", name: file.name });
      setCaption("");
      if (fileInput.current) fileInput.current.value = "";
    });
  }

  function remove(uploadId: number) {
    const body = new FormData();
    body.set("intent", "remove");
    body.set("uploadId", String(uploadId));
    post(body, () => setProgress({ state: "idle" }));
  }

  return (
    <section aria-labelledby="uploads-heading" className="space-y-3" data-testid="upload-panel">
      <h2 id="uploads-heading" className="text-xl">
        Drawings and photos
      </h2>
      {uploads.length ? (
        <ul className="space-y-1 text-sm" data-testid="upload-list">
          {uploads.map((upload) => (
            <li key={upload.id} className="flex items-center gap-3">
              <a href={upload.href} target="_blank" rel="noreferrer">
                {upload.name}
              </a>
              <span className="text-graphite-soft">
                {upload.contentType.replace("image/", "").replace("application/", "").toUpperCase()} ·{" "}
                {size(upload.byteSize)}
                {upload.caption ? ` · ${upload.caption}` : ""}
              </span>
              {editable ? (
                <button
                  type="button"
                  onClick={() => remove(upload.id)}
                  className="text-stop underline-offset-2 hover:underline"
                >
                  Remove
                </button>
              ) : null}
            </li>
          ))}
        </ul>
      ) : (
        <p className="text-sm text-graphite-soft">No files attached.</p>
      )}
      {editable ? (
        <div className="flex flex-wrap items-end gap-3">
          <label className="flex flex-col text-sm">
            File (SVG, PNG, JPEG or PDF, up to 5 MB)
            <input
              ref={fileInput}
              type="file"
              name="file"
              accept=".svg,.png,.jpg,.jpeg,.pdf,image/svg+xml,image/png,image/jpeg,application/pdf"
              className="text-sm"
            />
          </label>
          <label className="flex flex-col text-sm">
            Caption
            <input
              value={caption}
              onChange={(e) => setCaption(e.target.value)}
              className="rounded border border-rule bg-sheet px-2 py-1"
            />
          </label>
          <button
            type="button"
            onClick={send}
            disabled={progress.state === "sending"}
            className="rounded border border-rule px-3 py-1"
          >
            Attach
          </button>
        </div>
      ) : null}
      <div aria-live="polite" className="text-sm" data-testid="upload-status">
        {progress.state === "sending" ? (
          <span className="flex items-center gap-2">
            <progress max={100} value={progress.percent} className="w-48" /> {progress.percent} %
          </span>
        ) : progress.state === "failed" ? (
          <span className="text-stop">{progress.message}</span>
        ) : progress.state === "done" ? (
          <span className="text-vapour">Attached {progress.name}.</span>
        ) : null}
      </div>
    </section>
  );
}
