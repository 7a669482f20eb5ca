import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { Badge, Banner, Button, Card, FormStatus, Loading, Text, TextField } from '@/components/ui';
import { FindingList } from '@/components/ui/calculations/FindingList';
import { STATE_TONE } from '@/components/ui/review-tone';
import {
  useApproveMutation,
  useRecipeDiffQuery,
  useRecipeEvaluationQuery,
  useRecipeQuery,
  useReturnMutation,
  useReviewQuery,
  useSubmitMutation,
  useTastingsQuery,
  useWithdrawMutation,
} from '@/lib/api/recipes';
import { useBreweryCurrency } from '@/lib/api/session';
import type { Session } from '@/lib/api/types';
import { formatDate, formatDateTime, formatMoney } from '@/lib/format';
import { can } from '@/lib/roles';
import { REVIEW_STATE_LABELS } from '@/lib/schemas/reviews';
import { space } from '@/lib/theme';
import type { UnitSystem } from '@/lib/units';

import { RecipeSummary } from './RecipeSummary';

const ACTION_LABELS: Record<string, string> = {
  submitted: 'Submitted',
  approved: 'Approved',
  returned: 'Returned with changes',
  withdrawn: 'Approval withdrawn',
};

/** The way to production: submit, and for owners what to look at before deciding, then the decision; and the record. */
export function ReviewPanel({ recipeId, session }: { recipeId: number; session: Session }) {
  const review = useReviewQuery(recipeId);
  const owner = can(session.user.role, 'recipes.approve');
  const editor = can(session.user.role, 'recipes.submit');
  if (!review.data) return <Loading />;
  const { state, currentVersion, submittedVersion, approvedVersion, events } = review.data;
  return (
    <View style={styles.wrap}>
      <Card title="Where it stands" aside={<Badge label={REVIEW_STATE_LABELS[state]} tone={STATE_TONE[state]} />}>
        <Text>
          Newest version {currentVersion}
          {submittedVersion ? ` · version ${submittedVersion} waits for review` : ''}
          {approvedVersion
            ? ` · version ${approvedVersion} is approved for production`
            : ' · nothing approved for production yet'}
          .
        </Text>
        {editor && (state === 'draft' || state === 'returned') ? (
          <SubmitForm recipeId={recipeId} version={currentVersion} />
        ) : null}
        {owner && submittedVersion ? (
          <Decision
            recipeId={recipeId}
            version={submittedVersion}
            approvedVersion={approvedVersion}
            licensed={session.organisation.licensedForAlcohol}
            units={session.user.unitSystem}
          />
        ) : null}
        {owner && approvedVersion ? <Withdraw recipeId={recipeId} /> : null}
      </Card>
      <Card title="Record">
        {events.length === 0 ? <Text variant="muted">Nothing yet.</Text> : null}
        {events.map((e) => (
          <View key={e.id} style={styles.event}>
            <Text>
              {ACTION_LABELS[e.action] ?? e.action} · version {e.version} · {e.by ?? 'someone'} · {formatDateTime(e.at)}
              {e.selfApproved ? ' · approved by the submitter, the brewery’s only owner' : ''}
            </Text>
            {e.comment ? <Text variant="muted">“{e.comment}”</Text> : null}
            {e.overrideReason ? <Text variant="small">Danger finding overridden: {e.overrideReason}</Text> : null}
          </View>
        ))}
      </Card>
    </View>
  );
}

function SubmitForm({ recipeId, version }: { recipeId: number; version: number }) {
  const [message, setMessage] = useState('');
  const submit = useSubmitMutation(recipeId);
  const detail = useRecipeQuery(recipeId, version);
  const evaluation = useRecipeEvaluationQuery(detail.data?.content);
  const dangers = evaluation.data?.carbonation.findings.filter((f) => f.level === 'danger') ?? [];
  return (
    <View style={styles.form}>
      <FormStatus error={submit.error} />
      {dangers.length > 0 ? (
        <Banner tone="danger" title={`Version ${version} has a danger finding`}>
          {dangers.map((f) => f.message).join(' ')} An owner can approve it only by writing why it is acceptable, and
          never when its alcohol reaches the limit of a brewery not licensed for alcohol. Change the recipe first if you
          can.
        </Banner>
      ) : null}
      <TextField
        label="Message to the owners"
        value={message}
        onChangeText={setMessage}
        multiline
        placeholder="What changed, what to taste for"
      />
      <Button
        label={`Submit version ${version} for review`}
        busy={submit.isPending}
        onPress={() => submit.mutate({ version, message })}
        style={styles.left}
      />
    </View>
  );
}

/** What an owner sees before deciding: the submitted version's numbers and findings, tastings, and what changed. */
function Decision({
  recipeId,
  version,
  approvedVersion,
  licensed,
  units,
}: {
  recipeId: number;
  version: number;
  approvedVersion: number | null;
  licensed: boolean;
  units: UnitSystem;
}) {
  const detail = useRecipeQuery(recipeId, version);
  const evaluation = useRecipeEvaluationQuery(detail.data?.content);
  const tastings = useTastingsQuery(recipeId);
  const currency = useBreweryCurrency();
  const content = detail.data?.content;
  const names = detail.data?.ingredientNames ?? {};
  const tasted = tastings.data?.filter((t) => t.versionNumber <= version) ?? [];
  const diff = useRecipeDiffQuery(recipeId, approvedVersion, version);
  const approve = useApproveMutation(recipeId);
  const giveBack = useReturnMutation(recipeId);
  const [comment, setComment] = useState('');
  const [override, setOverride] = useState('');
  const dangers = evaluation.data?.carbonation.findings.filter((f) => f.level === 'danger') ?? [];
  const error = approve.error ?? giveBack.error;
  // The same rules the server applies (409 alcohol_limit, 400 on overrideReason), said before the button is pressed.
  const alcoholBlocked = !licensed && dangers.some((f) => f.code === 'alcohol-over-limit');
  const needsReason = dangers.length > 0 && override.trim() === '';
  const approveBlockedBy = alcoholBlocked
    ? 'Approval is closed: the worst-case alcohol is at or over the brewery’s limit and the brewery has not declared that it is licensed to make alcoholic beverages. Return it with changes.'
    : needsReason
      ? 'Approve needs your reason first: this version has a danger finding, so write above why it is acceptable. The reason is recorded and printed on the card.'
      : null;
  return (
    <View style={styles.form}>
      <Text variant="subheading">Version {version}, before you decide</Text>
      <View style={styles.columns}>
        <Card title="Findings" style={styles.column}>
          {evaluation.data ? (
            <>
              <FindingList findings={evaluation.data.carbonation.findings} />
              <Text variant="small">
                Allergens: {evaluation.data.allergens.length ? evaluation.data.allergens.join(', ') : 'none recorded'} ·
                cost per bottle:{' '}
                {evaluation.data.cost.perBottle === null
                  ? 'unknown'
                  : formatMoney(evaluation.data.cost.perBottle, currency, 3)}
              </Text>
            </>
          ) : (
            <Loading label="Working out its numbers…" />
          )}
        </Card>
        <View style={styles.column}>
          {content ? (
            <RecipeSummary content={content} names={names} units={units} />
          ) : (
            <Loading label="Loading the version…" />
          )}
        </View>
        <Card title={`Tastings (${tasted.length})`} style={styles.column}>
          {tasted.length === 0 ? <Text variant="small">Nobody has tasted this recipe yet.</Text> : null}
          {tasted.map((t) => (
            <View key={t.id} style={styles.event}>
              <Text variant="label">
                {formatDate(t.tastedOn)} · version {t.versionNumber} · {t.by ?? 'someone'}
              </Text>
              <Text variant="small">
                Sweetness {t.scores.sweetness}, sourness {t.scores.sourness}, fizz {t.scores.fizz}, flavour{' '}
                {t.scores.flavour} (of 5)
              </Text>
              {t.notes ? <Text>{t.notes}</Text> : null}
            </View>
          ))}
        </Card>
      </View>
      {approvedVersion !== null && diff.data ? (
        <View>
          <Text variant="label">Changed since approved version {approvedVersion}</Text>
          {diff.data.length === 0 ? (
            <Text variant="small">Nothing.</Text>
          ) : (
            diff.data.map((c, i) => (
              <Text key={i} variant="small">
                {c.what}: {c.before ?? '—'} → {c.after ?? '—'}
              </Text>
            ))
          )}
        </View>
      ) : null}
      <FormStatus error={error} />
      <TextField label="Comment" value={comment} onChangeText={setComment} multiline />
      {dangers.length > 0 && !alcoholBlocked ? (
        <>
          <Banner tone="danger" title="A danger finding blocks approval">
            Approve only if you write why it is acceptable; the reason is recorded.
          </Banner>
          <TextField
            label="Why you approve despite the danger finding"
            value={override}
            onChangeText={setOverride}
            multiline
          />
        </>
      ) : null}
      {approveBlockedBy ? <Text variant="small">{approveBlockedBy}</Text> : null}
      <View style={styles.row}>
        <Button
          label={`Approve version ${version}`}
          busy={approve.isPending}
          disabled={approveBlockedBy !== null || !evaluation.data}
          onPress={() => approve.mutate({ version, comment, overrideReason: override.trim() || null })}
        />
        <Button
          label="Return with changes"
          variant="secondary"
          busy={giveBack.isPending}
          onPress={() => giveBack.mutate({ version, comment })}
        />
      </View>
    </View>
  );
}

function Withdraw({ recipeId }: { recipeId: number }) {
  const [reason, setReason] = useState('');
  const withdraw = useWithdrawMutation(recipeId);
  return (
    <View style={styles.form}>
      <FormStatus error={withdraw.error} />
      <TextField label="Reason to withdraw the approval" value={reason} onChangeText={setReason} />
      <Button
        label="Withdraw approval"
        variant="danger"
        busy={withdraw.isPending}
        onPress={() => withdraw.mutate({ reason })}
        style={styles.left}
      />
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.lg },
  form: { gap: space.md, paddingTop: space.sm },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  event: { gap: space.xxs, paddingBottom: space.sm },
  // Side by side on a wide screen, one under another on a phone.
  columns: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md, alignItems: 'flex-start' },
  column: { flexGrow: 1, flexBasis: 300 },
  left: { alignSelf: 'flex-start' },
});
