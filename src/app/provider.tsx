import { QueryClientProvider } from '@tanstack/react-query';
import type { ReactNode } from 'react';
import { UndoToastProvider } from '@/components/ui/undo-toast';
import { queryClient } from '@/lib/query-client';

export function AppProvider({ children }: { children: ReactNode }) {
  return (
    <QueryClientProvider client={queryClient}>
      <UndoToastProvider>{children}</UndoToastProvider>
    </QueryClientProvider>
  );
}
