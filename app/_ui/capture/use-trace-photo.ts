"use client";

import { useCallback, useEffect, useLayoutEffect, useRef, useState, type RefObject } from "react";
import { callApi } from "../api-client";
import { photoProblem, sniffPhotoType, type PhotoType } from "./photo-file";
import { storeCasePhoto } from "./photo-upload";

// The photo under a trace: the one kept with the case profile when the panel opens, or a file chosen,
// checked by its bytes, turned upright by its EXIF orientation, drawn downscaled, and kept with the case.

/** The photo shown: its upright size in pixels (the original's) and where the browser can draw it from. */
export type TracePhoto = { src: string; widthPx: number; heightPx: number; storedId: string | null };

/** A photo chosen before its case profile is saved: the file as chosen, its checked type and its upright size. */
export type ChosenPhoto = { file: File; contentType: PhotoType; widthPx: number; heightPx: number };

export type PhotoNotice = { tone: "ok" | "error"; text: string };

/** The longest side a photo is drawn at; the original is kept as it was. */
const DISPLAY_MAX_PX = 1600;

type Options = {
  caseId: string | null;
  /** A new photo is on show: what was traced on the one before is cleared. */
  onNewPhoto: () => void;
  onPhotoChosen?: (photo: ChosenPhoto) => void;
};

/** A chosen file's checked type and its picture turned upright by its EXIF orientation, or why it cannot be used. */
async function readPhoto(file: File): Promise<{ ok: true; bitmap: ImageBitmap; type: PhotoType } | { ok: false; message: string; clearInput: boolean }> {
  const type = sniffPhotoType(new Uint8Array(await file.slice(0, 16).arrayBuffer()));
  const problem = photoProblem(file.size, type);
  if (problem || !type) return { ok: false, message: `${problem} Nothing was saved.`, clearInput: true };
  try {
    return { ok: true, bitmap: await createImageBitmap(file, { imageOrientation: "from-image" }), type };
  } catch {
    return { ok: false, message: "The file could not be read as an image (it may be damaged). Nothing was saved.", clearInput: false };
  }
}

/** Draws the decoded picture into the canvas at display size (the longest side at most DISPLAY_MAX_PX) once both are there. */
function useDisplayCanvas(canvasRef: RefObject<HTMLCanvasElement | null>, picture: RefObject<CanvasImageSource | null>, photo: TracePhoto | null) {
  useLayoutEffect(() => {
    const canvas = canvasRef.current;
    const source = picture.current;
    if (!canvas || !source || !photo) return;
    const k = Math.min(1, DISPLAY_MAX_PX / Math.max(photo.widthPx, photo.heightPx));
    canvas.width = Math.round(photo.widthPx * k);
    canvas.height = Math.round(photo.heightPx * k);
    canvas.getContext("2d")?.drawImage(source, 0, 0, canvas.width, canvas.height);
  }, [canvasRef, picture, photo]);
}

/** The photo last kept with the case profile, shown when the panel opens unless a file is chosen before it arrives. */
function useKeptPhoto(caseId: string | null, photoTurn: RefObject<number>, show: (img: HTMLImageElement, item: { id: string; url: string }) => void, setNotice: (n: PhotoNotice) => void) {
  useEffect(() => {
    if (!caseId) return;
    let live = true;
    const turn = photoTurn.current;
    const current = () => live && turn === photoTurn.current;
    void callApi<{ items: { id: string; state: string; url: string | null }[] }>(`/api/v1/cases/${caseId}/photos`).then((res) => {
      if (!current()) return;
      if (!res.ok) {
        if (res.status !== 404) setNotice({ tone: "error", text: res.error.message });
        return;
      }
      const latest = res.data.items.find((p) => p.state === "ready");
      if (!latest?.url) return;
      const item = { id: latest.id, url: latest.url };
      const img = new Image();
      img.onload = () => current() && show(img, item);
      img.onerror = () => current() && setNotice({ tone: "error", text: "The stored photo could not be shown; upload it again." });
      img.src = item.url;
    });
    return () => {
      live = false;
    };
  }, [caseId, photoTurn, show, setNotice]);
}

export function useTracePhoto({ caseId, onNewPhoto, onPhotoChosen }: Options) {
  const [photo, setPhoto] = useState<TracePhoto | null>(null);
  const [notice, setNotice] = useState<PhotoNotice | null>(null);
  const [busy, setBusy] = useState(false);
  // A chosen photo being decoded: the surface still shows the one before, and takes no clicks meanwhile.
  const [decoding, setDecoding] = useState(false);
  // Each photo asked for (the stored one on opening, or a chosen file) takes a turn; a late answer to an
  // earlier turn never replaces the photo asked for after it.
  const photoTurn = useRef(0);
  const canvasRef = useRef<HTMLCanvasElement>(null);
  const fileRef = useRef<HTMLInputElement>(null);

  // The decoded picture waits here until the canvas for it is on the page, then is drawn at display size.
  const picture = useRef<CanvasImageSource | null>(null);
  useDisplayCanvas(canvasRef, picture, photo);

  const showKept = useCallback((img: HTMLImageElement, item: { id: string; url: string }) => {
    picture.current = img;
    setPhoto({ src: item.url, widthPx: img.naturalWidth, heightPx: img.naturalHeight, storedId: item.id });
  }, []);
  useKeptPhoto(caseId, photoTurn, showKept, setNotice);

  /** Decodes a chosen file upright, or says why not; null when a later choice took over meanwhile. */
  async function decode(file: File, turn: number): Promise<{ bitmap: ImageBitmap; type: PhotoType } | null> {
    const read = await readPhoto(file);
    if (turn !== photoTurn.current) {
      if (read.ok) read.bitmap.close();
      return null;
    }
    setDecoding(false);
    if (read.ok) return read;
    if (read.clearInput && fileRef.current) fileRef.current.value = "";
    setNotice({ tone: "error", text: read.message });
    return null;
  }

  async function choose(file: File | undefined) {
    setNotice(null);
    if (!file) return;
    const turn = ++photoTurn.current;
    setDecoding(true);
    const decoded = await decode(file, turn);
    if (!decoded) return;
    const { bitmap, type } = decoded;
    const width = bitmap.width, height = bitmap.height;
    if (picture.current instanceof ImageBitmap) picture.current.close();
    picture.current = bitmap;
    setPhoto({ src: "", widthPx: width, heightPx: height, storedId: null });
    onNewPhoto();
    if (!caseId) {
      onPhotoChosen?.({ file, contentType: type, widthPx: width, heightPx: height });
      const keep = onPhotoChosen ? "It is kept with the case profile when you save it." : "Save the case profile to keep a photo with it.";
      setNotice({ tone: "ok", text: `Photo shown for tracing. ${keep}` });
      return;
    }
    setBusy(true);
    const stored = await storeCasePhoto(caseId, file, type, width, height);
    setBusy(false);
    // A photo chosen meanwhile is the one on show now; this one's outcome is no longer news.
    if (turn !== photoTurn.current) return;
    if (!stored.ok) setNotice({ tone: "error", text: `${stored.message} The photo is shown for tracing but was not kept.` });
    else {
      setPhoto((p) => (p ? { ...p, storedId: stored.id } : p));
      setNotice({ tone: "ok", text: "Photo kept with the case profile (shop only; customers never see it)." });
    }
  }

  return { photo, notice, busy, decoding, canvasRef, fileRef, choose };
}
