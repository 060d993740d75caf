package coilwright.sizing;

/**
 * A binary heap of positions 0..n-1 under a caller's order, without boxing (the survivors may number millions):
 * built in linear time, each removal in logarithmic time.
 */
final class PositionHeap {
    /** The order: negative when position a comes before position b. */
    @FunctionalInterface
    interface Order {
        int compare(int a, int b);
    }

    private final int[] heap;
    private final Order order;
    private int size;

    PositionHeap(int n, Order order) {
        this.heap = new int[n];
        this.order = order;
        for (int i = 0; i < n; i++) {
            heap[i] = i;
        }
        this.size = n;
        for (int i = n / 2 - 1; i >= 0; i--) {
            down(i);
        }
    }

    boolean isEmpty() {
        return size == 0;
    }

    int peek() {
        return heap[0];
    }

    int pop() {
        int top = heap[0];
        heap[0] = heap[--size];
        down(0);
        return top;
    }

    private void down(int i) {
        while (true) {
            int l = 2 * i + 1;
            if (l >= size) {
                return;
            }
            int c = l + 1 < size && order.compare(heap[l + 1], heap[l]) < 0 ? l + 1 : l;
            if (order.compare(heap[c], heap[i]) >= 0) {
                return;
            }
            int t = heap[c];
            heap[c] = heap[i];
            heap[i] = t;
            i = c;
        }
    }
}
