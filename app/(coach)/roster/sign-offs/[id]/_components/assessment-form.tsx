"use client";

import { useId, useMemo, useState } from "react";
import Link from "next/link";
import { useForm, useWatch } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import type { z } from "zod";
import { Button } from "@/components/ui/button";
import { LiveStatus, Notice } from "@/components/ui/notice";
import type { ChecklistItem } from "@/lib/content/module-schema";
import { assessmentOutcome, checklistVerdictLabels, checklistVerdicts, type ChecklistVerdict } from "@/lib/clearance/checklist";
import { assessmentSchemaFor, maxEvidencePhotos } from "@/lib/validations/certification";
import { recordAssessmentAction } from "../actions";
import { reachAction } from "@/lib/http/reach-action";
import { ClientForm } from "@/components/ui/client-form";

const maxPhotoBytes = 8 * 1024 * 1024;

interface Photo {
  id: string;
  url: string;
}

interface AssessmentFormProps {
  assessmentId: string;
  athleteName: string;
  checklist: ChecklistItem[];
  photos: Photo[];
}

type AssessmentSchema = ReturnType<typeof assessmentSchemaFor>;

/**
 * The poolside form: for each checklist item a real radio pair (met / not yet) in a fieldset, a note,
 * and photos uploaded as they are taken. The same zod schema checks it here and on the server.
 */
export function AssessmentForm({ assessmentId, athleteName, checklist, photos: initialPhotos }: AssessmentFormProps) {
  const noteId = useId();
  const photoId = useId();
  const schema = useMemo(() => assessmentSchemaFor(checklist), [checklist]);
  const [photos, setPhotos] = useState<Photo[]>(initialPhotos);
  const [uploading, setUploading] = useState(false);
  const [photoMessage, setPhotoMessage] = useState<{ ok: boolean; text: string } | null>(null);
  const [result, setResult] = useState<{ ok: boolean; message: string } | null>(null);
  const form = useForm<z.input<AssessmentSchema>, unknown, z.output<AssessmentSchema>>({
    resolver: zodResolver(schema),
    defaultValues: { items: {}, note: "", evidenceIds: initialPhotos.map((photo) => photo.id) },
  });
  const { errors, isSubmitting } = form.formState;
  const verdicts = useWatch({ control: form.control, name: "items" }) as Record<string, ChecklistVerdict | undefined> | undefined;
  const answered = checklist.filter((item) => verdicts?.[item.id]).length;
  const outcome = answered === checklist.length ? assessmentOutcome(checklist, verdicts ?? {}) : null;

  function keepPhotos(next: Photo[]) {
    setPhotos(next);
    form.setValue(
      "evidenceIds",
      next.map((photo) => photo.id),
    );
  }

  async function uploadPhoto(event: React.ChangeEvent<HTMLInputElement>) {
    const file = event.target.files?.[0];
    event.target.value = "";
    if (!file) return;
    if (file.size > maxPhotoBytes) {
      setPhotoMessage({ ok: false, text: "That photo is larger than 8 MB. Take it at a lower resolution." });
      return;
    }
    setUploading(true);
    setPhotoMessage(null);
    try {
      const body = new FormData();
      body.append("file", file);
      const response = await fetch(`/api/sign-offs/${assessmentId}/evidence`, { method: "POST", body });
      const answer = (await response.json().catch(() => ({}))) as {
        id?: string;
        url?: string;
        message?: string;
      };
      if (response.ok && answer.id && answer.url) {
        keepPhotos([...photos, { id: answer.id, url: answer.url }]);
        setPhotoMessage({ ok: true, text: `Photo ${photos.length + 1} added.` });
      } else {
        setPhotoMessage({ ok: false, text: answer.message ?? "The photo could not be added." });
      }
    } catch {
      setPhotoMessage({ ok: false, text: "No connection; the photo was not added." });
    } finally {
      setUploading(false);
    }
  }

  async function removePhoto(photo: Photo) {
    const response = await fetch(photo.url, { method: "DELETE" }).catch(() => null);
    if (!response) {
      setPhotoMessage({ ok: false, text: "No connection; the photo was not removed." });
    } else if (response.ok || response.status === 404) {
      keepPhotos(photos.filter((entry) => entry.id !== photo.id));
      setPhotoMessage({ ok: true, text: "Photo removed." });
    } else {
      setPhotoMessage({ ok: false, text: "The photo could not be removed." });
    }
  }

  const onSubmit = form.handleSubmit(async (values) => {
    const outcomeOfAction = await reachAction(() => recordAssessmentAction(assessmentId, values));
    setResult(outcomeOfAction.ok ? { ok: true, message: outcomeOfAction.message ?? "Recorded." } : outcomeOfAction);
    if (!outcomeOfAction.ok)
      for (const [field, messages] of Object.entries(outcomeOfAction.fieldErrors)) {
        if (field === "note" || field.startsWith("items.")) form.setError(field as "note", { message: messages[0] });
      }
  });

  const itemErrors = (errors.items ?? {}) as Record<string, { message?: string } | undefined>;

  const done = result?.ok === true;

  return (
    <div className="space-y-4">
      {!done && (
        <ClientForm onSubmit={onSubmit} noValidate className="space-y-6" data-testid="assessment-form">
          <div className="space-y-4">
            {checklist.map((item, index) => {
              const error = itemErrors[item.id]?.message;
              const errorId = `${assessmentId}-${item.id}-error`;
              return (
                <fieldset
                  key={item.id}
                  className="rounded-lg border border-slate-300 bg-white p-4"
                  aria-describedby={error ? errorId : undefined}
                  data-testid={`checklist-${item.id}`}
                >
                  <legend className="px-1 font-semibold">
                    {index + 1}. {item.label}
                  </legend>
                  <div className="mt-2 grid grid-cols-2 gap-3">
                    {checklistVerdicts.map((verdict) => (
                      <label
                        key={verdict}
                        className="flex min-h-12 cursor-pointer items-center gap-3 rounded-md border-2 border-slate-300 px-3 py-2 font-semibold has-[:checked]:border-river-700 has-[:checked]:bg-river-100"
                      >
                        <input
                          type="radio"
                          value={verdict}
                          className="h-5 w-5 accent-river-700"

                          {...form.register(`items.${item.id}`)}
                        />
                        <span aria-hidden="true">{verdict === "met" ? "✓" : "✕"}</span>
                        {checklistVerdictLabels[verdict]}
                      </label>
                    ))}
                  </div>
                  {error && (
                    <p id={errorId} className="mt-2 text-sm font-semibold text-alarm-800">
                      <span aria-hidden="true">⚠ </span>
                      {error}
                    </p>
                  )}
                </fieldset>
              );
            })}
          </div>

          <div className="flex flex-col gap-1">
            <label htmlFor={noteId} className="font-semibold">
              Note for {athleteName}
            </label>
            <p id={`${noteId}-hint`} className="text-sm text-slate-700">
              Needed when anything is not yet met: say what to practise before the next try.
            </p>
            <textarea
              id={noteId}
              rows={4}
              className="w-full rounded-md border border-slate-500 px-3 py-2 text-base aria-[invalid=true]:border-alarm-600"
              aria-invalid={errors.note ? true : undefined}
              aria-describedby={`${noteId}-hint${errors.note ? ` ${noteId}-error` : ""}`}
              {...form.register("note")}
            />
            {errors.note?.message && (
              <p id={`${noteId}-error`} className="text-sm font-semibold text-alarm-800">
                <span aria-hidden="true">⚠ </span>
                {errors.note.message}
              </p>
            )}
          </div>

          <div className="space-y-2 rounded-lg border border-slate-300 bg-white p-4">
            <label htmlFor={photoId} className="font-semibold">
              Photo evidence (optional)
            </label>
            <p id={`${photoId}-hint`} className="text-sm text-slate-700">
              JPEG, PNG or WebP, up to 8 MB each, at most {maxEvidencePhotos}. Only the athlete and the club&apos;s coaches and
              administrators can see them.
            </p>
            <input
              id={photoId}
              type="file"
              accept="image/jpeg,image/png,image/webp"
              capture="environment"
              aria-describedby={`${photoId}-hint`}
              disabled={uploading || photos.length >= maxEvidencePhotos}
              onChange={uploadPhoto}
              className="block min-h-11 w-full text-base"
            />
            {uploading && <p role="status">Uploading…</p>}
            <LiveStatus testId="photo-status">
              {photoMessage && <Notice tone={photoMessage.ok ? "success" : "error"} title={photoMessage.text} />}
            </LiveStatus>
            {photos.length > 0 && (
              <ul className="flex flex-wrap gap-3" data-testid="evidence-photos">
                {photos.map((photo, index) => (
                  <li key={photo.id} className="flex flex-col items-start gap-1">
                    {/* eslint-disable-next-line @next/next/no-img-element -- private, permission-checked images; next/image would cache them */}
                    <img
                      src={photo.url}
                      alt={`Evidence photo ${index + 1}`}
                      className="h-24 w-24 rounded border border-slate-300 object-cover"
                    />
                    <button type="button" onClick={() => removePhoto(photo)} className="min-h-11 text-sm text-alarm-800 underline">
                      Remove photo {index + 1}
                    </button>
                  </li>
                ))}
              </ul>
            )}
          </div>

          <div className="space-y-3">
            <p data-testid="assessment-outcome">
              {outcome === "passed" && "✓ Every item met: recording this signs the module off and issues the certificate."}
              {outcome === "not-yet" && "✕ Not everything met: the athlete is sent back with your note."}
              {outcome === null && `${answered} of ${checklist.length} items answered.`}
            </p>
            <Button type="submit" pending={isSubmitting} pendingLabel="Recording…" className="w-full sm:w-auto">
              Record the sign-off
            </Button>
          </div>
        </ClientForm>
      )}
      <LiveStatus testId="assessment-status">
        {result && <Notice tone={result.ok ? "success" : "error"} title={result.message} />}
      </LiveStatus>
      {done && (
        <p className="flex flex-wrap gap-4">
          <Link href="/roster/sign-offs" className="font-semibold text-river-700 underline">
            Next sign-off
          </Link>
          <Link href="/roster" className="text-river-700 underline">
            Roster
          </Link>
        </p>
      )}
    </div>
  );
}
