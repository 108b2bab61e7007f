// Property tests over random valid projects (RandomProjectGenerator, fixed seed):
// the solver returns finite numbers, every section balances, and the project file
// round-trips. Balances are conservation laws, so they need no outside numbers.

#include "RandomProjectGenerator.h"
#include "ResultChecks.h"

#include "airwright/core/InputError.h"
#include "airwright/core/chain/ChainSolver.h"
#include "airwright/core/project/ProjectFile.h"

#include <gtest/gtest.h>

#include <cstdlib>
#include <filesystem>
#include <random>
#include <string>
#include <vector>

using namespace Airwright::Core;
using namespace Airwright::Core::Chain;
using Airwright::Core::Project::ProjectFile;

namespace {

constexpr int kProjects = 200;
constexpr std::uint32_t kSeed = 20260417u;

Project::Project demoProject()
{
    Project::LoadReport report;
    return ProjectFile::load(std::filesystem::path(AIRWRIGHT_SOURCE_DIR) / "resources" / "demo" / "demo-library.awproj",
                             report);
}

class ScratchFolder {
public:
    ScratchFolder()
    {
        std::random_device seed;
        m_path = std::filesystem::temp_directory_path()
                 / ("airwright-property-" + std::to_string(seed()) + "-" + std::to_string(seed()));
        std::filesystem::create_directories(m_path);
    }
    ~ScratchFolder()
    {
        std::error_code ignored;
        std::filesystem::remove_all(m_path, ignored);
    }
    ScratchFolder(const ScratchFolder&) = delete;
    ScratchFolder& operator=(const ScratchFolder&) = delete;
    const std::filesystem::path& path() const { return m_path; }

private:
    std::filesystem::path m_path;
};

} // namespace

// Random valid projects: finite numbers, every single-path section balanced, and
// every coupled section (plates, loops, wheels with their crossing flows
// EATR/OACF, mixing) balanced over both paths, energy to 0.1 % of the duty plus
// the condensate's enthalpy, non-convergence reported. A project that
// ChainSolver::check refuses (flows contradicting each other in a case, fans
// heating the air beyond 200 C; the file loads so it can be put right) is not a
// valid project: it is skipped from the balances, but solve must refuse it with
// an InputError, and such projects must stay a small minority.
TEST(ChainProperty, RandomProjectsSolveFiniteAndBalanced)
{
    Property::RandomProjectGenerator generator(demoProject(), kSeed);
    int notConverged = 0;
    int refused = 0;
    int casesSolved = 0;
    std::vector<int> failing;
    for (int n = 0; n < kProjects; ++n) {
        const auto project = generator.next();
        SCOPED_TRACE("project " + std::to_string(n) + " of seed " + std::to_string(kSeed));
        const auto failuresBefore = ::testing::UnitTest::GetInstance()->current_test_info()->result()->total_part_count();
        const auto problems = ChainSolver::check(project.unit);
        if (!problems.empty()) {
            // Invalid input: solve refuses it as check does.
            ++refused;
            EXPECT_THROW(ChainSolver::solve(project.unit), InputError) << problems.front().path << ": " << problems.front().message;
        } else {
            try {
                const UnitResult result = ChainSolver::solve(project.unit);
                ASSERT_EQ(result.cases.size(), project.unit.cases.size());
                Property::expectAllFinite(result);
                for (const auto& c : result.cases) {
                    Property::expectBalances(c);
                    Property::expectConvergenceReported(c, project.unit);
                    notConverged += c.converged ? 0 : 1;
                    ++casesSolved;
                }
            } catch (const std::exception& e) {
                ADD_FAILURE() << "solve threw for a project that check accepts: " << e.what();
            }
        }
        if (::testing::UnitTest::GetInstance()->current_test_info()->result()->total_part_count() != failuresBefore) {
            // The first few failing projects in full, to reproduce them with airwright-cli;
            // all of them as files when AIRWRIGHT_PROPERTY_DUMP names a folder.
            if (failing.size() < 3)
                ADD_FAILURE() << "failing project:\n" << ProjectFile::serialize(project);
            if (const char* dump = std::getenv("AIRWRIGHT_PROPERTY_DUMP"))
                ProjectFile::save(project, std::filesystem::path(dump) / ("project-" + std::to_string(n) + ".awproj"));
            failing.push_back(n);
        }
    }
    EXPECT_TRUE(failing.empty()) << failing.size() << " failing projects, the first " << failing.front();
    EXPECT_EQ(casesSolved, (kProjects - refused) * 3);
    // Informational: how many random cases did not settle (each reported as a finding).
    RecordProperty("not_converged_cases", notConverged);
    RecordProperty("refused_projects", refused);
    // Invalid projects must stay a small minority: more than one in ten would
    // mean the generator or the checks have drifted.
    EXPECT_LE(refused, kProjects / 10);
}

TEST(ChainProperty, RandomProjectsRoundTripThroughTheFile)
{
    Property::RandomProjectGenerator generator(demoProject(), kSeed);
    ScratchFolder folder;
    const auto file = folder.path() / "random.awproj";
    for (int n = 0; n < kProjects; ++n) {
        const auto project = generator.next();
        SCOPED_TRACE("project " + std::to_string(n) + " of seed " + std::to_string(kSeed));
        // What save writes passes the file's own checks ...
        const auto problems = ProjectFile::check(project);
        ASSERT_TRUE(problems.empty()) << problems.front().text() << "\n" << ProjectFile::serialize(project);
        // ... and save -> load -> save writes the same text again.
        ASSERT_NO_THROW(ProjectFile::save(project, file));
        Project::LoadReport report;
        const auto loaded = ProjectFile::load(file, report);
        EXPECT_TRUE(report.warnings.empty());
        const std::string first = ProjectFile::serialize(project);
        ASSERT_NO_THROW(ProjectFile::save(loaded, file));
        Project::LoadReport secondReport;
        const auto reloaded = ProjectFile::load(file, secondReport);
        ASSERT_EQ(ProjectFile::serialize(loaded), first);
        ASSERT_EQ(ProjectFile::serialize(reloaded), first);
        EXPECT_EQ(reloaded, loaded);
    }
}
