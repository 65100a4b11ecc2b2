import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';

import { api } from '@/api';
import { studyPartKey } from '@/features/studies/study-cache';

import type { CommentAnchor, StudyComment } from './types';

const commentsPath = (studyId: number) => `/studies/${encodeURIComponent(studyId)}/comments`;
export const commentsKey = (studyId: number) => studyPartKey(studyId, 'comments');

export function useComments(studyId: number) {
  return useQuery({
    queryKey: commentsKey(studyId),
    queryFn: async () => (await api.get<{ comments: StudyComment[] }>(commentsPath(studyId))).data.comments,
  });
}

export function useAddComment(studyId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: { body: string; anchor?: CommentAnchor }) =>
      (await api.post<{ comment: StudyComment }>(commentsPath(studyId), input)).data.comment,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: commentsKey(studyId) }),
  });
}

export function useDeleteComment(studyId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (commentId: number) => {
      await api.delete(`${commentsPath(studyId)}/${encodeURIComponent(commentId)}`);
    },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: commentsKey(studyId) }),
  });
}
