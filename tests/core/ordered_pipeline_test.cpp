// OrderedPipeline: blocks worked on threads come out in the order they went in; the first
// failure in input order is the one reported; no workers means the same result in one thread.
#include "core/ordered_pipeline.h"

#include <gtest/gtest.h>

#include <chrono>
#include <stdexcept>
#include <string>
#include <thread>
#include <vector>

namespace pw {
namespace {

struct Block {
    int id = -1;
    long value = 0;
};

// Feeds `count` blocks; block i's work squares i after a delay that makes later blocks tend
// to finish first. Returns the ids in the order the sink saw them.
std::vector<int> runPipeline(unsigned workers, int count, int failAt = -1) {
    std::vector<int> seen;
    OrderedPipeline<Block> pipeline(
        workers, 2 * workers + 2, [] { return Block{}; },
        [failAt](Block &b) {
            std::this_thread::sleep_for(std::chrono::microseconds((b.id * 37) % 300));
            if (b.id == failAt || (failAt >= 0 && b.id == failAt + 3))
                throw std::runtime_error("block " + std::to_string(b.id));
            b.value = static_cast<long>(b.id) * b.id;
        },
        [&seen](Block &b) {
            EXPECT_EQ(b.value, static_cast<long>(b.id) * b.id);
            seen.push_back(b.id);
        });
    for (int i = 0; i < count; ++i) {
        pipeline.next().id = i;
        pipeline.submit();
    }
    pipeline.finish();
    return seen;
}

TEST(OrderedPipeline, BlocksComeOutInInputOrderForAnyNumberOfWorkers) {
    for (unsigned workers : {0u, 1u, 2u, 7u}) {
        const std::vector<int> seen = runPipeline(workers, 300);
        ASSERT_EQ(seen.size(), 300u) << workers;
        for (int i = 0; i < 300; ++i) ASSERT_EQ(seen[static_cast<std::size_t>(i)], i) << workers;
    }
}

TEST(OrderedPipeline, TheFirstFailureInInputOrderIsReported) {
    for (unsigned workers : {0u, 3u}) {
        try {
            runPipeline(workers, 200, 120);  // blocks 120 and 123 fail
            FAIL() << "no exception with " << workers << " workers";
        } catch (const std::runtime_error &e) {
            EXPECT_STREQ(e.what(), "block 120");
        }
    }
}

TEST(OrderedPipeline, NothingSubmittedSinksNothing) { EXPECT_TRUE(runPipeline(2, 0).empty()); }

TEST(OrderedPipeline, DestroyedMidwayStopsWithoutSinkingTheRest) {
    int sunk = 0;
    {
        OrderedPipeline<Block> pipeline(
            2, 4, [] { return Block{}; },
            [](Block &) { std::this_thread::sleep_for(std::chrono::milliseconds(1)); },
            [&sunk](Block &) { ++sunk; });
        for (int i = 0; i < 10; ++i) {
            pipeline.next().id = i;
            pipeline.submit();
        }
        // No finish(): an error elsewhere abandons the run.
    }
    // Block i's next() made room by sinking block i - 4 at least; the last block submitted
    // after the last next() is never sunk.
    EXPECT_GE(sunk, 6);
    EXPECT_LT(sunk, 10);
}

}  // namespace
}  // namespace pw
