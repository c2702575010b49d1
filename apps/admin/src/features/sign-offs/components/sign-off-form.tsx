import {
  signOffCreateSchema,
  type SignOff,
  type SignOffCreate,
  type SignOffCreateInput,
  type TeachMember,
  type Training,
} from '@chuckkey/core';
import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { Controller, useForm, useWatch, type DefaultValues } from 'react-hook-form';
import { ChosenMember } from '../../../components/chosen-member';
import { MemberPhoto } from '../../../components/member-photo';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { CheckboxField } from '../../../components/ui/checkbox-field';
import { ChoiceGroup, RadioOption } from '../../../components/ui/choice-group';
import { SelectField } from '../../../components/ui/select-field';
import { TextAreaField } from '../../../components/ui/text-area-field';
import { TextLink } from '../../../components/ui/text-link';
import { paths } from '../../../config/paths';
import { useFocusedNotice } from '../../../hooks/use-focused-notice';
import { useMemberChoice } from '../../../hooks/use-member-choice';
import { useServerErrors } from '../../../hooks/use-server-errors';
import { ApiError } from '../../../lib/api-client';
import { useCreateSignOff } from '../api/create-sign-off';
import { previewValidUntil, validUntilDate } from '../utils/sign-off-dates';
import { CandidateChoice } from './candidate-choice';

const fields = ['memberId', 'trainingId', 'level', 'checklist', 'note'] as const;

const errorOptions = {
  codeFields: {
    member_not_found: 'memberId' as const,
    member_inactive: 'memberId' as const,
    cannot_sign_off_self: 'memberId' as const,
    training_not_found: 'trainingId' as const,
    training_inactive: 'trainingId' as const,
  },
  messages: {
    member_not_found: 'That member is no longer in the shop’s records. Search again.',
    member_inactive: 'This member’s membership is inactive. An admin has to reactivate it before they can be signed off.',
    cannot_sign_off_self: 'Nobody can sign themselves off. Ask another instructor.',
    training_not_found: 'That training no longer exists. Choose another.',
    training_inactive: 'That training is no longer taught. Choose its current version.',
  },
};

const emptyForm: DefaultValues<SignOffCreateInput> = { memberId: '', trainingId: '', checklist: [], note: '' };

const levelMeanings = {
  supervised: 'May use the machines only while a supervisor is on duty.',
  independent: 'May use the machines without a supervisor on duty, within the shop’s hours and rules.',
};

interface SignOffFormProps {
  trainings: Training[];
  timeZone: string;
  currentUserId: string;
}

export function SignOffForm({ trainings, timeZone, currentUserId }: SignOffFormProps) {
  const create = useCreateSignOff();
  const [done, setDone, doneRef] = useFocusedNotice<SignOff | null>(null);
  const [now, setNow] = useState(() => new Date());

  const {
    register,
    control,
    handleSubmit,
    setError,
    setValue,
    reset,
    formState: { errors, isSubmitted },
  } = useForm<SignOffCreateInput, unknown, SignOffCreate>({ resolver: zodResolver(signOffCreateSchema), defaultValues: emptyForm });
  const { formError, setFormError, showServerError } = useServerErrors(setError, fields, errorOptions);
  const { member, choose, forget, chosenRef, searchRef } = useMemberChoice<TeachMember>((next) =>
    setValue('memberId', next?.id ?? '', { shouldValidate: isSubmitted }),
  );

  const trainingId = useWatch({ control, name: 'trainingId' });
  const level = useWatch({ control, name: 'level' });
  const ticked = useWatch({ control, name: 'checklist' }) ?? [];
  const training = trainings.find((t) => t.id === trainingId);
  const items = training?.checklist ?? [];
  const allTicked = items.every((item) => ticked.includes(item.id));
  const preview = training ? previewValidUntil(now, training.validityMonths, timeZone) : null;

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    setDone(null);
    try {
      const signOff = await create.mutateAsync(values);
      reset(emptyForm);
      forget();
      setNow(new Date());
      setDone(signOff);
    } catch (error) {
      if (error instanceof ApiError && error.code === 'checklist_incomplete') {
        // The server names the items not ticked; they belong under the checklist, in a sentence.
        const missing = error.fieldErrors.checklist ?? [];
        setError('checklist', { type: 'server', message: `Not ticked yet: ${missing.join('; ')}. Every item must be seen before signing off.` }, { shouldFocus: true });
        return;
      }
      showServerError(error);
    }
  });

  return (
    <div className="flex flex-col gap-5">
      {done && (
        <Alert ref={doneRef} tabIndex={-1} tone="success" title="Signed off">
          <p>
            {done.memberName} on {done.trainingName}, {done.level},{' '}
            {done.expiresAt ? `valid until ${validUntilDate(done.expiresAt, timeZone)}` : 'never lapses'}.
          </p>
          <p>
            <TextLink to={paths.memberRecord.getHref(done.memberId)} state={{ name: done.memberName }}>
              Open {done.memberName}&apos;s record
            </TextLink>
          </p>
        </Alert>
      )}

      <form noValidate onSubmit={onSubmit} aria-label="Sign off a member" className="flex flex-col gap-6">
        {formError && <Alert tone="error">{formError}</Alert>}
        <input type="hidden" {...register('memberId')} />

        <section className="flex flex-col gap-3">
          <h3 className="text-lg font-bold text-neutral-900">
            1. Member
          </h3>
          {member ? (
            <ChosenMember
              member={member}
              caption="Signing off"
              cardRef={chosenRef}
              error={errors.memberId?.message}
              errorId="sign-off-member-error"
              onChange={() => choose(null)}
              picture={<MemberPhoto memberId={member.id} name={member.name} />}
              note="Check that the photo is the person in front of you."
            />
          ) : (
            <CandidateChoice
              label="Find the member"
              inputRef={searchRef}
              error={errors.memberId?.message}
              onChoose={choose}
              whyNot={(candidate) =>
                candidate.id === currentUserId ? 'You can’t sign yourself off.' : !candidate.active ? 'Inactive: an admin has to reactivate them first.' : null
              }
            />
          )}
        </section>

        <section className="flex flex-col gap-4">
          <h3 className="text-lg font-bold text-neutral-900">
            2. Training and practical check
          </h3>
          <SelectField
            label="Training"
            error={errors.trainingId?.message}
            {...register('trainingId', { onChange: () => setValue('checklist', []) })}
          >
            <option value="">Choose a training</option>
            {trainings.map((option) => (
              <option key={option.id} value={option.id}>
                {option.name}
              </option>
            ))}
          </SelectField>
          {training?.description && <p className="max-w-prose text-neutral-800">{training.description}</p>}

          {training && (
            <Controller
              control={control}
              name="checklist"
              render={({ field }) => (
                <ChoiceGroup
                  legend="Practical checklist"
                  hint="Tick each item you saw the member do, safely, in front of you. Every item must be ticked."
                  error={errors.checklist?.message}
                >
                  <ul className="flex flex-col gap-2">
                    {items.map((item, index) => {
                      const checked = (field.value ?? []).includes(item.id);
                      return (
                        <li key={item.id}>
                          <CheckboxField
                            ref={index === 0 ? field.ref : undefined}
                            size="large"
                            label={item.label}
                            name={field.name}
                            value={item.id}
                            checked={checked}
                            onBlur={field.onBlur}
                            onChange={(event) => {
                              const current = field.value ?? [];
                              field.onChange(event.target.checked ? [...current, item.id] : current.filter((id) => id !== item.id));
                            }}
                          />
                        </li>
                      );
                    })}
                  </ul>
                  <p aria-live="polite" className="text-sm font-bold text-neutral-800">
                    {ticked.length} of {items.length} ticked
                  </p>
                </ChoiceGroup>
              )}
            />
          )}
        </section>

        <section className="flex flex-col gap-4">
          <h3 className="text-lg font-bold text-neutral-900">
            3. Level and note
          </h3>
          <ChoiceGroup legend="Level" error={errors.level?.message}>
            <RadioOption label="Supervised" description={levelMeanings.supervised} value="supervised" {...register('level')} />
            <RadioOption label="Independent" description={levelMeanings.independent} value="independent" {...register('level')} />
          </ChoiceGroup>
          <TextAreaField
            label="Note (optional)"
            hint="The member sees it on their record: what went well, what to practise next."
            rows={3}
            error={errors.note?.message}
            {...register('note')}
          />
        </section>

        <section className="flex flex-col gap-3 rounded-lg border border-neutral-300 bg-neutral-50 p-4">
          <h3 className="text-lg font-bold text-neutral-900">
            Before you confirm
          </h3>
          <dl className="grid grid-cols-1 gap-x-4 gap-y-1 sm:grid-cols-[auto_1fr]">
            <dt className="text-neutral-700">Member</dt>
            <dd className="font-bold">{member?.name ?? 'Not chosen yet'}</dd>
            <dt className="text-neutral-700">Training</dt>
            <dd className="font-bold">{training?.name ?? 'Not chosen yet'}</dd>
            <dt className="text-neutral-700">Level</dt>
            <dd className="font-bold">{level === 'supervised' ? 'Supervised' : level === 'independent' ? 'Independent' : 'Not chosen yet'}</dd>
            <dt className="text-neutral-700">Validity</dt>
            <dd className="font-bold">
              {preview?.text ?? 'Depends on the training'}
            </dd>
          </dl>
          <p className="text-sm text-neutral-800">
            Sign off only what you saw done safely, in person. A sign-off does not replace the shop&apos;s rules, local codes or
            in-person training.
          </p>
          <div className="flex flex-col gap-2">
            <div>
              <Button type="submit" pending={create.isPending} disabled={!allTicked} aria-describedby={allTicked ? undefined : 'sign-off-blocked'}>
                Confirm sign-off
              </Button>
            </div>
            {!allTicked && (
              <p id="sign-off-blocked" className="text-sm text-neutral-800">
                Tick all {items.length} checklist items to confirm; {ticked.length} ticked so far.
              </p>
            )}
          </div>
        </section>
      </form>
    </div>
  );
}
