import { useMutation, useQueryClient } from '@tanstack/react-query';
import { DatasheetDtoSchema, type DatasheetDto, type ProposalReviewBody } from '@understudy/shared-types';
import { api } from '../../../lib/api-client';
import { datasheetKeys } from '../keys';

export interface ReviewProposalInput {
  datasheetId: string;
  proposalId: string;
  body: ProposalReviewBody;
}

export function reviewProposal({ datasheetId, proposalId, body }: ReviewProposalInput): Promise<DatasheetDto> {
  return api.patch(
    `/datasheets/${encodeURIComponent(datasheetId)}/proposals/${encodeURIComponent(proposalId)}`,
    body,
    DatasheetDtoSchema,
  );
}

function withDecision(sheet: DatasheetDto, proposalId: string, body: ProposalReviewBody): DatasheetDto {
  if (!sheet.extraction) return sheet;
  return {
    ...sheet,
    extraction: {
      ...sheet.extraction,
      proposals: sheet.extraction.proposals.map((p) =>
        p.id === proposalId
          ? { ...p, decision: body.decision, editedValue: body.decision === 'edited' ? body.value : null }
          : p,
      ),
    },
  };
}

/** Takes one proposal from the server's answer, leaving the others as they are (their own saves may be in flight). */
function withServerProposal(sheet: DatasheetDto, answer: DatasheetDto, proposalId: string): DatasheetDto {
  const fresh = answer.extraction?.proposals.find((p) => p.id === proposalId);
  if (!sheet.extraction || !fresh) return answer;
  return {
    ...answer,
    extraction: { ...answer.extraction!, proposals: sheet.extraction.proposals.map((p) => (p.id === proposalId ? fresh : p)) },
  };
}

/** Each decision is saved as it is made and shown at once; a refusal puts the proposal back as it was. */
export function useReviewProposal(datasheetId: string) {
  const queryClient = useQueryClient();
  const key = datasheetKeys.detail(datasheetId);
  return useMutation({
    mutationKey: datasheetKeys.review(datasheetId),
    mutationFn: (input: Omit<ReviewProposalInput, 'datasheetId'>) => reviewProposal({ datasheetId, ...input }),
    onMutate: async ({ proposalId, body }) => {
      await queryClient.cancelQueries({ queryKey: key, exact: true });
      const before = queryClient.getQueryData<DatasheetDto>(key)?.extraction?.proposals.find((p) => p.id === proposalId);
      queryClient.setQueryData<DatasheetDto>(key, (sheet) => (sheet ? withDecision(sheet, proposalId, body) : sheet));
      return { before };
    },
    onSuccess: (answer, { proposalId }) => {
      queryClient.setQueryData<DatasheetDto>(key, (sheet) => (sheet ? withServerProposal(sheet, answer, proposalId) : answer));
    },
    onError: (_error, { proposalId }, context) => {
      const before = context?.before;
      if (!before) return;
      queryClient.setQueryData<DatasheetDto>(key, (sheet) =>
        sheet?.extraction
          ? { ...sheet, extraction: { ...sheet.extraction, proposals: sheet.extraction.proposals.map((p) => (p.id === proposalId ? before : p)) } }
          : sheet,
      );
    },
  });
}
