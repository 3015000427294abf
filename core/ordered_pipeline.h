#pragma once
// Blocks of work done on worker threads and delivered in the order they were made.
//
// The calling thread fills blocks (next(), then submit()); worker threads run `work` on each
// submitted block; the calling thread hands finished blocks to `sink` strictly in submission
// order (inside next() and finish()), so all I/O of the sink stays on one thread. At most
// `depth` blocks are in flight: memory stays flat however long the input is. With no workers,
// `work` runs in the calling thread inside submit().
//
// An exception thrown by `work` is kept with its block and rethrown by next() or finish() when
// that block's turn to be sunk comes: the first failure in input order wins, as it would
// without threads. An exception from `sink` propagates directly. The destructor stops the
// workers and drops unfinished blocks (a failed run writes nothing more).
#include <condition_variable>
#include <cstddef>
#include <cstdint>
#include <exception>
#include <functional>
#include <mutex>
#include <thread>
#include <utility>
#include <vector>

namespace pw {

template <class Block>
class OrderedPipeline {
public:
    using Make = std::function<Block()>;
    using Step = std::function<void(Block &)>;

    OrderedPipeline(unsigned workers, std::size_t depth, const Make &make, Step work, Step sink)
        : work_(std::move(work)), sink_(std::move(sink)) {
        if (depth < 1) depth = 1;
        slots_.reserve(depth);
        for (std::size_t i = 0; i < depth; ++i) slots_.push_back({make(), State::Free, nullptr});
        try {
            for (unsigned i = 0; i < workers; ++i) threads_.emplace_back([this] { serve(); });
        } catch (...) {  // a thread could not be started: stop the ones that were
            stopWorkers();
            throw;
        }
    }
    OrderedPipeline(const OrderedPipeline &) = delete;
    OrderedPipeline &operator=(const OrderedPipeline &) = delete;
    ~OrderedPipeline() { stopWorkers(); }

    // A free block to fill (sinks finished blocks meanwhile). Call submit() before next().
    Block &next() {
        Slot &s = slot(made_);
        for (;;) {
            sinkReady();
            std::unique_lock lock(mutex_);
            if (s.state == State::Free) break;
            done_.wait(lock, [&] { return slot(sunk_).state == State::Done; });
        }
        return s.block;
    }

    // Hands the block from next() to the workers (or works it here without workers).
    void submit() {
        Slot &s = slot(made_);
        {
            const std::lock_guard lock(mutex_);
            s.state = State::Queued;
            ++made_;
        }
        if (threads_.empty())
            run(s);
        else
            wake_.notify_one();
    }

    // Waits for every submitted block and sinks them in order.
    void finish() {
        while (sunk_ < made_) {
            sinkReady();
            std::unique_lock lock(mutex_);
            if (sunk_ < made_) done_.wait(lock, [&] { return slot(sunk_).state == State::Done; });
        }
    }

private:
    enum class State { Free, Queued, Done };
    struct Slot {
        Block block;
        State state;
        std::exception_ptr error;
    };

    Slot &slot(std::uint64_t index) { return slots_[index % slots_.size()]; }

    void stopWorkers() {
        {
            const std::lock_guard lock(mutex_);
            stop_ = true;
        }
        wake_.notify_all();
        for (std::thread &t : threads_) t.join();
    }

    void run(Slot &s) {
        try {
            work_(s.block);
        } catch (...) {
            s.error = std::current_exception();
        }
        const std::lock_guard lock(mutex_);
        s.state = State::Done;
    }

    // Sinks the finished blocks that are next in order (the lock is not held while sinking).
    void sinkReady() {
        for (;;) {
            Slot &s = slot(sunk_);
            {
                const std::lock_guard lock(mutex_);
                if (sunk_ == made_ || s.state != State::Done) return;
            }
            if (s.error) std::rethrow_exception(std::exchange(s.error, nullptr));
            sink_(s.block);
            const std::lock_guard lock(mutex_);
            s.state = State::Free;
            ++sunk_;
        }
    }

    void serve() {
        for (;;) {
            Slot *s = nullptr;
            {
                std::unique_lock lock(mutex_);
                wake_.wait(lock, [&] { return stop_ || worked_ < made_; });
                if (stop_) return;
                s = &slot(worked_++);
            }
            run(*s);
            done_.notify_all();
        }
    }

    Step work_, sink_;
    std::vector<Slot> slots_;
    std::vector<std::thread> threads_;
    std::mutex mutex_;
    std::condition_variable wake_;  // a block was queued, or stop
    std::condition_variable done_;  // a block was finished
    bool stop_ = false;
    // Counters of blocks, each changed under the lock: submitted (by the producer), taken by a
    // worker, and sunk (by the producer). Block i lives in slot i % depth.
    std::uint64_t made_ = 0;
    std::uint64_t worked_ = 0;
    std::uint64_t sunk_ = 0;
};

}  // namespace pw
